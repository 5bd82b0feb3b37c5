package org.variset.cli.command;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.file.Path;
import java.util.List;
import org.variset.archive.store.Archive;
import org.variset.cli.ExitCode;
import org.variset.cli.internal.ConsoleProgress;
import org.variset.cli.internal.IndexUpkeep;
import org.variset.cli.internal.Json;
import org.variset.imports.load.ArchiveImporter;
import org.variset.imports.load.ImportOptions;
import org.variset.imports.load.ImportSummary;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** Imports interchange files into the archive. */
@Command(
        name = "import",
        mixinStandardHelpOptions = true,
        description = {
            "Import routes, holds and walls from CSV files, an XLSX workbook (sheets routes, holds, "
                    + "walls) or a JSON document.",
            "One import writes every row or none. Importing the same rows again adds nothing; a changed row for a "
                    + "route already in the archive is refused, with its differences, unless --update is given.",
            "Errors are listed as file:line: column: what is wrong (what was expected)."
        },
        footer = {
            "",
            "Examples:",
            "  variset import routes.csv holds.csv",
            "  variset import reset.xlsx --dry-run",
            "  variset import spring.json --skip-bad-rows"
        })
final class ImportCommand extends VarisetSubcommand {
    @Parameters(paramLabel = "FILE", arity = "1..*", description = "Files to import (.csv, .xlsx, .json).")
    List<Path> files;

    @Option(names = "--dry-run", description = "Check the files and say what would change; write nothing.")
    boolean dryRun;

    @Option(names = "--skip-bad-rows", description = "Import the good rows and list each skipped one.")
    boolean skipBadRows;

    @Option(names = "--update", description = "Let changed rows replace what the archive holds for their route.")
    boolean update;

    @Mixin
    FormatOptions format;

    @Override
    ExitCode execute() {
        ImportOptions options = ImportOptions.defaults()
                .withDryRun(dryRun)
                .withSkipBadRows(skipBadRows)
                .withUpdate(update);
        ImportSummary s;
        try (Archive archive = openArchive();
                ConsoleProgress progress = new ConsoleProgress(err(), ConsoleProgress.onTerminal(), root().verbose)) {
            s = new ArchiveImporter(archive).run(files, options, progress);
            if (!s.dryRun()) {
                long start = System.nanoTime();
                IndexUpkeep.afterWrite(archive, err(), progress.indexing());
                progress.finished("updating the search index", System.nanoTime() - start);
            }
        }
        if (format.json()) {
            out().println(Json.write(json(s)));
        } else {
            print(s);
        }
        return ExitCode.OK;
    }

    private void print(ImportSummary s) {
        String changed = s.dryRun() ? " would change" : " changed";
        out().println((s.dryRun() ? "Dry run, nothing written: " : "Imported: ") + s.routesNew() + " routes new, "
                + s.routesUnchanged() + " unchanged, " + s.routesChanged() + changed + "; " + s.holdsWritten()
                + " holds" + (s.dryRun() ? " would be" : "") + " written; " + s.wallsNew() + " walls new, "
                + s.wallsChanged() + changed + ".");
        s.changes().forEach(c -> out().println("  changed: " + c));
        if (!s.extraColumns().isEmpty()) {
            out().println("Extra columns kept as extra fields: " + String.join(", ", sorted(s.extraColumns())));
        }
        if (!s.unknownTerms().isEmpty()) {
            out().println("Not in the vocabulary, kept as written: " + String.join(", ", sorted(s.unknownTerms())));
        }
        if (s.skippedCount() > 0) {
            out().println("Skipped " + s.skippedCount() + " bad rows:");
            s.skipped().forEach(p -> out().println("  " + p));
        }
    }

    private static List<String> sorted(java.util.Set<String> set) {
        return set.stream().sorted().toList();
    }

    private static ObjectNode json(ImportSummary s) {
        ObjectNode o = Json.object();
        o.put("dry_run", s.dryRun());
        o.putObject("routes")
                .put("new", s.routesNew())
                .put("unchanged", s.routesUnchanged())
                .put("changed", s.routesChanged());
        o.putObject("walls").put("new", s.wallsNew()).put("changed", s.wallsChanged());
        o.put("holds_written", s.holdsWritten());
        s.changes().forEach(o.putArray("changes")::add);
        o.put("skipped_rows", s.skippedCount());
        s.skipped().forEach(o.putArray("skipped")::add);
        s.extraColumns().stream().sorted().forEach(o.putArray("extra_columns")::add);
        s.unknownTerms().stream().sorted().forEach(o.putArray("unknown_terms")::add);
        return o;
    }
}
