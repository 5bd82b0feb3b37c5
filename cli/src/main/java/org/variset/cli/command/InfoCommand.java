package org.variset.cli.command;

import org.variset.app.Json;
import org.variset.app.Workspace;
import org.variset.app.archive.ArchiveInfo;
import org.variset.archive.location.ArchiveLocation;
import org.variset.archive.store.ArchiveStats;
import org.variset.cli.ExitCode;
import org.variset.cli.render.CliWords;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;

/** Says what the archive holds. */
@Command(
        name = "info",
        mixinStandardHelpOptions = true,
        description = "Show what the archive holds: gyms, walls, resets, routes, holds, setters, the span of "
                + "set dates, and the schema version.")
final class InfoCommand extends VarisetSubcommand {
    @Mixin
    FormatOptions format;

    @Override
    ExitCode execute() {
        ArchiveLocation where = root().location();
        ArchiveInfo.Result r;
        try (Workspace w = workspace()) {
            r = ArchiveInfo.of(w, where);
        }
        if (format.json()) {
            out().println(Json.write(r.json()));
            return ExitCode.OK;
        }
        ArchiveStats s = r.stats();
        out().printf("Archive   %s (from %s)%n", where.shown(), CliWords.origin(where));
        if (where.shared()) {
            out().printf("Index     %s (this client's own)%n", where.indexDir());
        }
        out().printf("Schema    version %d%n", s.schemaVersion());
        out().printf("Gyms      %d%n", s.gyms());
        out().printf("Walls     %d%n", s.walls());
        out().printf("Resets    %d%n", s.resets());
        out().printf("Routes    %d%n", s.routes());
        out().printf("Holds     %d%n", s.holds());
        out().printf("Setters   %d%n", s.setters());
        out().printf("Set dates %s%n", s.firstSetOn() == null ? "none yet" : s.firstSetOn() + " to " + s.lastSetOn());
        if (s.routes() == 0) {
            out().println("The archive is empty: add sets with 'variset import FILE...'.");
        }
        return ExitCode.OK;
    }
}
