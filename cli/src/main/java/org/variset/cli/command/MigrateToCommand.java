package org.variset.cli.command;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.List;
import org.variset.archive.location.ArchiveLocation;
import org.variset.archive.store.Archive;
import org.variset.archive.store.ArchiveLock;
import org.variset.archive.transfer.ArchiveTransfer;
import org.variset.cli.ExitCode;
import org.variset.cli.internal.Json;
import org.variset.cli.render.CliWords;
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
        if (source.shared()) {
            throw new IllegalArgumentException("migrate-to copies an embedded archive, and this run names the shared "
                    + "archive " + source.shown() + " (from " + CliWords.origin(source)
                    + "); name the embedded one with "
                    + "--archive DIR");
        }
        ArchiveLocation target = ArchiveLocation.resolve(
                null, url, root().cli().env(), root().cli().home());
        long start = System.nanoTime();
        List<ArchiveTransfer.Copied> copied;
        try (Archive from = Archive.open(source.dir());
                Archive to = Archive.openServer(target.server(), target.clientDir(), true, ArchiveLock.DEFAULT_WAIT)) {
            copied = ArchiveTransfer.copy(from, to, (table, rows) -> {
                if (!format.json()) {
                    err().printf("variset: copied %s (%d rows), verified%n", table, rows);
                    err().flush();
                }
            });
        }
        double seconds = (System.nanoTime() - start) / 1e9;
        if (format.json()) {
            ObjectNode o = Json.object();
            o.put("from", source.dir().toString());
            o.put("to", target.shown());
            o.put("verified", true);
            ArrayNode tables = o.putArray("tables");
            for (ArchiveTransfer.Copied c : copied) {
                ObjectNode t = tables.addObject();
                t.put("table", c.table());
                t.put("rows", c.rows());
                t.put("sha256", c.sha256());
            }
            out().println(Json.write(o));
            return ExitCode.OK;
        }
        out().printf(
                        "Copied the archive at %s into %s in %.1f s; every table's rows and SHA-256 match:%n",
                        source.dir(), target.shown(), seconds);
        for (ArchiveTransfer.Copied c : copied) {
            out().printf(
                            "  %-15s %,10d rows  %s%n",
                            c.table(), c.rows(), c.sha256().substring(0, 16));
        }
        out().println("Use it with: variset --db '" + target.shown() + "' info");
        return ExitCode.OK;
    }
}
