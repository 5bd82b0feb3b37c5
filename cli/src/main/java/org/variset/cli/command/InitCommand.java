package org.variset.cli.command;

import com.fasterxml.jackson.databind.node.ObjectNode;
import org.variset.archive.location.ArchiveLocation;
import org.variset.archive.store.Archive;
import org.variset.cli.ExitCode;
import org.variset.cli.internal.Json;
import org.variset.cli.render.CliWords;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;

/** Creates an empty archive. */
@Command(
        name = "init",
        mixinStandardHelpOptions = true,
        description = {
            "Create an empty archive (see --archive and --db for where). With --db, makes the archive's tables "
                    + "in an empty PostgreSQL database (or schema).",
            "Running it again on an existing archive changes nothing and says so."
        })
final class InitCommand extends VarisetSubcommand {
    @Mixin
    FormatOptions format;

    @Override
    ExitCode execute() {
        ArchiveLocation where = root().location();
        boolean existed;
        int version;
        if (where.shared()) {
            try (Archive archive = Archive.openServer(
                    where.server(), where.clientDir(), true, org.variset.archive.store.ArchiveLock.DEFAULT_WAIT)) {
                existed = !archive.wasCreated();
                version = archive.schemaVersion().version();
            }
        } else {
            existed = Archive.existsAt(where.dir());
            try (Archive archive = existed ? Archive.open(where.dir()) : Archive.create(where.dir())) {
                version = archive.schemaVersion().version();
            }
        }
        if (format.json()) {
            ObjectNode o = Json.object();
            o.put("archive", where.shown());
            o.put("created", !existed);
            o.put("schema_version", version);
            out().println(Json.write(o));
        } else if (existed) {
            out().println("There is already an archive at " + where.shown() + " (schema version " + version
                    + "); nothing changed.");
        } else {
            out().println("Created an empty archive at " + where.shown() + " (schema version " + version + ", "
                    + "location from " + CliWords.origin(where) + ").");
        }
        return ExitCode.OK;
    }
}
