package org.variset.cli.command;

import org.variset.app.Json;
import org.variset.app.archive.InitArchive;
import org.variset.archive.location.ArchiveLocation;
import org.variset.cli.ExitCode;
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
        InitArchive.Result r = InitArchive.at(where);
        if (format.json()) {
            out().println(Json.write(r.json()));
        } else if (!r.created()) {
            out().println("There is already an archive at " + where.shown() + " (schema version " + r.schemaVersion()
                    + "); nothing changed.");
        } else {
            out().println("Created an empty archive at " + where.shown() + " (schema version " + r.schemaVersion()
                    + ", location from " + CliWords.origin(where) + ").");
        }
        return ExitCode.OK;
    }
}
