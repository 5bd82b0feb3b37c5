package org.variset.cli.command;

import org.variset.app.Json;
import org.variset.app.Workspace;
import org.variset.app.archive.CheckArchive;
import org.variset.archive.check.CheckReport;
import org.variset.cli.ExitCode;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/** Checks the archive's database and search index. */
@Command(
        name = "check",
        mixinStandardHelpOptions = true,
        description = {
            "Check the archive: the database (schema version, every row reads back, nothing refers to a "
                    + "row that is gone, every route on its reset's wall) and the search index (Lucene's check, one "
                    + "document per route, in step with the database). The exit status is 0 when all is well, 3 when "
                    + "something is not.",
            "",
            "--repair rebuilds what is derived (the index). Database problems cannot be repaired here: restore the "
                    + "latest backup ('variset restore FILE')."
        })
final class CheckCommand extends VarisetSubcommand {
    @Option(names = "--repair", description = "Rebuild the search index when it is not sound or not in step.")
    boolean repair;

    @Mixin
    FormatOptions format;

    @Override
    ExitCode execute() {
        CheckArchive.Result r;
        try (Workspace w = workspace()) {
            r = CheckArchive.run(w, repair);
        }
        if (format.json()) {
            out().println(Json.write(r.json()));
        } else {
            print(r.report(), r.repaired());
        }
        return r.report().healthy() ? ExitCode.OK : ExitCode.ARCHIVE;
    }

    private void print(CheckReport report, boolean repaired) {
        String part = "";
        for (CheckReport.Item i : report.items()) {
            if (!i.part().equals(part)) {
                part = i.part();
                out().println(part.equals("database") ? "Database" : "Search index");
            }
            out().println("  " + (i.ok() ? "ok      " : i.note() ? "note    " : "PROBLEM ") + i.name() + ": "
                    + i.detail());
        }
        if (repaired) {
            out().println("The search index was rebuilt from the database.");
        }
        if (report.healthy() && report.hasNotes() && !repaired) {
            out().println("The archive is healthy. The search index is only behind the database (as after a crash "
                    + "between their commits): the next search brings it up to date, or run 'variset check --repair'"
                    + " now.");
        } else if (report.healthy()) {
            out().println("The archive is healthy.");
        } else if (report.databaseHealthy()) {
            out().println("The database is healthy; the search index is not. Rebuild it with 'variset check --repair'"
                    + " (any search also brings it up to date).");
        } else {
            out().println("The database has problems. Restore your latest backup with 'variset restore FILE', and "
                    + "keep this archive folder aside for inspection.");
        }
    }
}
