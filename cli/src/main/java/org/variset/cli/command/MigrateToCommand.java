package org.variset.cli.command;

import org.variset.app.Json;
import org.variset.app.archive.MigrateArchive;
import org.variset.archive.location.ArchiveLocation;
import org.variset.archive.transfer.ArchiveTransfer;
import org.variset.cli.ExitCode;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Parameters;

/** Copies the embedded archive into an empty shared one on a PostgreSQL server, verified. */
@Command(
        name = "migrate-to",
        mixinStandardHelpOptions = true,
        description = {
            "Copy this embedded archive (see --archive) into an empty shared archive on a PostgreSQL "
                    + "server, for a chain whose gyms and head office all use one archive.",
            "",
            "The server's database (or schema) gets the archive's tables if it has none, and must hold no gyms, "
                    + "routes or holds yet. Everything is copied in one transaction; before it commits, each table's "
                    + "row count and a SHA-256 of its rows are read back from the server and compared with the "
                    + "embedded archive's, and they are compared once more after the commit. A copy that does not match "
                    + "is not committed. The embedded archive is not changed.",
            "",
            "Afterwards use the server with --db URL (or VARISET_DB); each client builds its own search index on "
                    + "first use. The password comes from PGPASSWORD or ~/.pgpass, never from the address."
        })
final class MigrateToCommand extends VarisetSubcommand {
    @Parameters(
            paramLabel = "URL",
            description = "The shared archive, as postgresql://[user@]host[:port]/database" + "[?currentSchema=name].")
    String url;

    @Mixin
    FormatOptions format;

    @Override
    ExitCode execute() {
        ArchiveLocation source = root().location();
        ArchiveLocation target = ArchiveLocation.resolve(
                null, url, root().cli().env(), root().cli().home());
        MigrateArchive.Result r = MigrateArchive.run(source, target, (table, rows) -> {
            if (!format.json()) {
                err().printf("variset: copied %s (%d rows), verified%n", table, rows);
                err().flush();
            }
        });
        if (format.json()) {
            out().println(Json.write(r.json()));
            return ExitCode.OK;
        }
        out().printf(
                        "Copied the archive at %s into %s in %.1f s; every table's rows and SHA-256 match:%n",
                        source.dir(), target.shown(), r.seconds());
        for (ArchiveTransfer.Copied c : r.tables()) {
            out().printf(
                            "  %-15s %,10d rows  %s%n",
                            c.table(), c.rows(), c.sha256().substring(0, 16));
        }
        out().println("Use it with: variset --db '" + target.shown() + "' info");
        return ExitCode.OK;
    }
}
