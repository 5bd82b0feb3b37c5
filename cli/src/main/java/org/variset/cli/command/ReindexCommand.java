package org.variset.cli.command;

import org.variset.app.Workspace;
import org.variset.app.archive.ReindexArchive;
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
        ReindexArchive.Result r;
        try (Workspace w = workspace();
                ConsoleProgress progress = new ConsoleProgress(err(), ConsoleProgress.onTerminal())) {
            r = ReindexArchive.run(w, (d, t) -> progress.advanced("indexing routes", d));
        }
        out().printf(
                        "Indexed %d routes in %.1f s (change stamp %d).%n",
                        r.sync().routes(), r.seconds(), r.sync().stamp());
        return ExitCode.OK;
    }
}
