package org.variset.cli.command;

import picocli.CommandLine.Option;

/** The {@code --gym} option of commands that may leave it out when the archive holds one gym. */
public final class GymOptions {
    @Option(names = "--gym", paramLabel = "GYM", description = "The gym (needed when the archive holds several).")
    String gym;
}
