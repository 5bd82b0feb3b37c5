package org.variset.cli.command;

import java.nio.file.Path;
import org.variset.app.Workspace;
import org.variset.app.imports.ExportGym;
import org.variset.archive.gym.PartialDate;
import org.variset.cli.ExitCode;
import org.variset.cli.convert.PartialDateConverter;
import org.variset.imports.export.ArchiveExporter;
import org.variset.imports.export.ExportFormat;
import org.variset.reports.format.FigureFormat;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/** Writes a gym's walls, routes and holds in an interchange format. */
@Command(
        name = "export",
        mixinStandardHelpOptions = true,
        description = {
            "Write a gym's walls, routes and holds as CSV files (walls.csv, routes.csv, holds.csv in a "
                    + "folder), an XLSX workbook or a JSON document.",
            "Importing the export into an empty archive gives the same content. Text a spreadsheet would run as a "
                    + "formula is prefixed with ' (import removes it)."
        },
        footer = {
            "",
            "Examples:",
            "  variset export --gym \"Harbour Hall\" --format csv --out backup/",
            "  variset export --gym \"Harbour Hall\" --from 2026-03 --to 2026-05 --format xlsx --out spring.xlsx"
        })
final class ExportCommand extends VarisetSubcommand {
    @Option(names = "--gym", required = true, paramLabel = "GYM", description = "The gym to export.")
    String gym;

    @Option(
            names = "--from",
            paramLabel = "DATE",
            converter = PartialDateConverter.class,
            description = "Routes set on or after this day (YYYY-MM-DD, or YYYY-MM for the whole month).")
    PartialDate from;

    @Option(
            names = "--to",
            paramLabel = "DATE",
            converter = PartialDateConverter.class,
            description = "Routes set on or before this day (a month covers all its days).")
    PartialDate to;

    @Option(names = "--wall", paramLabel = "WALL", description = "Only this wall.")
    String wall;

    @Option(names = "--format", required = true, paramLabel = "FORMAT", description = "csv, xlsx or json.")
    ExportFormat format;

    @Option(
            names = "--out",
            required = true,
            paramLabel = "PATH",
            description = "A folder for csv, a file for xlsx and json.")
    Path out;

    @Option(names = "--force", description = "Replace files that exist.")
    boolean force;

    @Override
    ExitCode execute() {
        ArchiveExporter.Result r;
        try (Workspace w = workspace()) {
            r = ExportGym.run(
                    w,
                    new ArchiveExporter.Selection(
                            gym, from == null ? null : from.first(), to == null ? null : to.last(), wall),
                    format,
                    out,
                    force);
        }
        out().println("Exported " + FigureFormat.count(r.walls(), "wall") + ", "
                + FigureFormat.count(r.routes(), "route")
                + " and " + FigureFormat.count(r.holds(), "hold") + " to "
                + String.join(", ", r.files().stream().map(Path::toString).toList()) + ".");
        return ExitCode.OK;
    }
}
