package org.variset.cli.command;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import org.variset.app.Json;
import org.variset.app.Workspace;
import org.variset.app.imports.ImportFiles;
import org.variset.cli.ExitCode;
import org.variset.cli.internal.ConsoleProgress;
import org.variset.imports.load.ImportOptions;
import org.variset.imports.load.ImportSummary;
import org.variset.reports.format.FigureFormat;
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

    @Option(
            names = "--new-name",
            paramLabel = "NAME",
            description = "Create this gym, wall or setter although its name is close to one the archive or the files "
                    + "already have (\"Milk slab\" beside \"Milk Slab\" is refused without it). Repeat for several.")
    List<String> newNames = new ArrayList<>();

    @Mixin
    FormatOptions format;

    @Override
    ExitCode execute() {
        ImportOptions options = ImportOptions.defaults()
                .withDryRun(dryRun)
                .withSkipBadRows(skipBadRows)
                .withUpdate(update)
                .withNewNames(Set.copyOf(newNames));
        ImportFiles.Result r;
        try (Workspace w = workspace();
                ConsoleProgress progress = new ConsoleProgress(err(), ConsoleProgress.onTerminal(), root().verbose)) {
            r = new ImportFiles(w).run(files, options, progress);
        }
        if (format.json()) {
            out().println(Json.write(r.json()));
        } else {
            print(r.summary());
        }
        return ExitCode.OK;
    }

    private void print(ImportSummary s) {
        String changed = s.dryRun() ? " would change" : " changed";
        out().println((s.dryRun() ? "Dry run, nothing written: " : "Imported: ")
                + FigureFormat.count(s.routesNew(), "route") + " new, " + s.routesUnchanged() + " unchanged, "
                + s.routesChanged() + changed + "; " + FigureFormat.count(s.holdsWritten(), "hold")
                + (s.dryRun() ? " would be" : "") + " written; " + FigureFormat.count(s.wallsNew(), "wall") + " new, "
                + s.wallsChanged() + changed + ".");
        s.changes().forEach(c -> out().println("  changed: " + c));
        String created = s.dryRun() ? "would be new" : "new";
        if (!s.newGyms().isEmpty()) {
            out().println("  gyms " + created + ": " + String.join(", ", s.newGyms()));
        }
        if (!s.newWalls().isEmpty()) {
            boolean oneGym = s.newWalls().stream()
                            .map(ImportSummary.NewWall::gym)
                            .distinct()
                            .count()
                    == 1;
            out().println("  walls " + created + ": "
                    + String.join(
                            ", ",
                            s.newWalls().stream()
                                    .map(w -> oneGym ? w.wall() : w.wall() + " (" + w.gym() + ")")
                                    .toList())
                    + (oneGym ? " (" + s.newWalls().get(0).gym() + ")" : ""));
        }
        if (!s.newSetters().isEmpty()) {
            out().println("  setters " + created + ": " + String.join(", ", s.newSetters()));
        }
        s.warnings().forEach(w -> err().println("variset: warning: " + w));
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

    private static List<String> sorted(Set<String> set) {
        return set.stream().sorted().toList();
    }
}
