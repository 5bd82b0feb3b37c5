package org.variset.cli.command;

import org.variset.archive.search.IndexSync;
import org.variset.archive.search.SearchIndex;
import org.variset.archive.store.Archive;
import org.variset.cli.ExitCode;
import org.variset.cli.internal.ConsoleProgress;
import picocli.CommandLine.Command;

/** Builds the search index again from the database. */
@Command(
        name = "reindex",
        mixinStandardHelpOptions = true,
        description = {
            "Build the search index again from the archive's database. The index is derived data: "
                    + "imports and changes keep it current, and a search that finds it behind or missing brings it up to "
                    + "date itself; reindex is for when you want to be sure."
        })
final class ReindexCommand extends VarisetSubcommand {
    @Override
    ExitCode execute() {
        long start = System.nanoTime();
        IndexSync s;
        try (Archive archive = openArchive();
                ConsoleProgress progress = new ConsoleProgress(err(), ConsoleProgress.onTerminal());
                SearchIndex index = SearchIndex.of(archive)) {
            s = index.rebuild(archive.connection(), (d, t) -> progress.advanced("indexing routes", d), "asked for");
        }
        out().printf(
                        "Indexed %d routes in %.1f s (change stamp %d).%n",
                        s.routes(), (System.nanoTime() - start) / 1e9, s.stamp());
        return ExitCode.OK;
    }
}
