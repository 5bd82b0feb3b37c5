package org.variset.cli.command;

import java.nio.file.Path;
import java.util.List;
import org.variset.app.imports.WriteTemplates;
import org.variset.cli.ExitCode;
import org.variset.imports.export.ExportFormat;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/** Writes empty interchange files with the right headers. Needs no archive. */
@Command(
        name = "template",
        mixinStandardHelpOptions = true,
        description = {
            "Write empty walls, routes and holds files with the right headers and one example row "
                    + "(CSV), or one workbook with drop-down lists for hold type, role, size and discipline (XLSX)."
        },
        footer = {"", "Example:", "  variset template --format xlsx --out ."})
final class TemplateCommand extends VarisetSubcommand {
    @Option(names = "--format", required = true, paramLabel = "FORMAT", description = "csv or xlsx.")
    ExportFormat format;

    @Option(names = "--out", required = true, paramLabel = "DIR", description = "The folder to write into.")
    Path out;

    @Option(names = "--force", description = "Replace files that exist.")
    boolean force;

    @Override
    ExitCode execute() {
        List<Path> files = WriteTemplates.into(out, format, force);
        out().println("Wrote "
                + String.join(", ", files.stream().map(Path::toString).toList()) + ".");
        return ExitCode.OK;
    }
}
