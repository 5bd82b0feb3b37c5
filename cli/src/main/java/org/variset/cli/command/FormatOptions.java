package org.variset.cli.command;

import picocli.CommandLine.Option;

/** The {@code --format} option, the same on every command that prints a result. */
public final class FormatOptions {
    @Option(
            names = "--format",
            paramLabel = "FORMAT",
            defaultValue = "text",
            description = "Output format: text or json (default: ${DEFAULT-VALUE}).")
    OutputFormat format;

    /** True when JSON was asked for. */
    boolean json() {
        return format == OutputFormat.JSON;
    }
}
