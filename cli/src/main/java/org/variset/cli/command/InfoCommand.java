package org.variset.cli.command;

import com.fasterxml.jackson.databind.node.ObjectNode;
import org.variset.archive.location.ArchiveLocation;
import org.variset.archive.store.Archive;
import org.variset.archive.store.ArchiveStats;
import org.variset.cli.ExitCode;
import org.variset.cli.internal.Json;
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
        ArchiveStats s;
        try (Archive archive = openArchive()) {
            s = archive.stats();
        }
        if (format.json()) {
            ObjectNode o = Json.object();
            o.put("archive", where.shown());
            o.put("shared", where.shared());
            o.put("schema_version", s.schemaVersion());
            o.put("gyms", s.gyms());
            o.put("walls", s.walls());
            o.put("resets", s.resets());
            o.put("routes", s.routes());
            o.put("holds", s.holds());
            o.put("setters", s.setters());
            o.put("first_set_on", s.firstSetOn() == null ? null : s.firstSetOn().toString());
            o.put("last_set_on", s.lastSetOn() == null ? null : s.lastSetOn().toString());
            out().println(Json.write(o));
            return ExitCode.OK;
        }
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
