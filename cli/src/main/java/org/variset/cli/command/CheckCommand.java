package org.variset.cli.command;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.variset.archive.check.ArchiveCheck;
import org.variset.archive.check.CheckReport;
import org.variset.archive.search.IndexProgress;
import org.variset.archive.search.SearchIndex;
import org.variset.archive.store.Archive;
import org.variset.cli.ExitCode;
import org.variset.cli.internal.Json;
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
        CheckReport report;
        boolean repaired = false;
        try (Archive archive = openArchive();
                SearchIndex index = SearchIndex.of(archive)) {
            report = ArchiveCheck.run(archive, index);
            if (repair && !report.healthy() && report.databaseHealthy()) {
                index.rebuild(archive.connection(), IndexProgress.NONE, "repair asked for");
                repaired = true;
                report = ArchiveCheck.run(archive, index);
            }
        }
        if (format.json()) {
            ObjectNode o = Json.object().put("healthy", report.healthy()).put("index_rebuilt", repaired);
            ArrayNode a = o.putArray("checks");
            report.items()
                    .forEach(i -> a.addObject()
                            .put("part", i.part())
                            .put("check", i.name())
                            .put("ok", i.ok())
                            .put("detail", i.detail()));
            out().println(Json.write(o));
        } else {
            print(report, repaired);
        }
        return report.healthy() ? ExitCode.OK : ExitCode.ARCHIVE;
    }

    private void print(CheckReport report, boolean repaired) {
        String part = "";
        for (CheckReport.Item i : report.items()) {
            if (!i.part().equals(part)) {
                part = i.part();
                out().println(part.equals("database") ? "Database" : "Search index");
            }
            out().println("  " + (i.ok() ? "ok      " : "PROBLEM ") + i.name() + ": " + i.detail());
        }
        if (repaired) {
            out().println("The search index was rebuilt from the database.");
        }
        if (report.healthy()) {
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
