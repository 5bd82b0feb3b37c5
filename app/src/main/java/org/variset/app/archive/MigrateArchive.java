package org.variset.app.archive;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.List;
import java.util.function.BiConsumer;
import org.variset.app.Json;
import org.variset.archive.location.ArchiveLocation;
import org.variset.archive.problem.InputException;
import org.variset.archive.problem.Remedy;
import org.variset.archive.store.Archive;
import org.variset.archive.store.ArchiveLock;
import org.variset.archive.transfer.ArchiveTransfer;

/** Copies an embedded archive into an empty shared one on a PostgreSQL server, verified before and after commit. */
public final class MigrateArchive {
    private MigrateArchive() {}

    /**
     * What was copied.
     *
     * @param from the embedded archive
     * @param to the shared one
     * @param tables each table with its rows and SHA-256, all matching
     * @param seconds how long it took
     */
    public record Result(
            ArchiveLocation from, ArchiveLocation to, List<ArchiveTransfer.Copied> tables, double seconds) {
        /** The result for scripts. */
        public ObjectNode json() {
            ObjectNode o = Json.object()
                    .put("from", from.dir().toString())
                    .put("to", to.shown())
                    .put("verified", true);
            ArrayNode a = o.putArray("tables");
            tables.forEach(c ->
                    a.addObject().put("table", c.table()).put("rows", c.rows()).put("sha256", c.sha256()));
            return o;
        }
    }

    /**
     * Copies {@code from} into {@code to}; {@code progress} hears of each table once copied and verified.
     *
     * @throws InputException when {@code from} is not an embedded archive or {@code to} is not a shared one
     */
    public static Result run(ArchiveLocation from, ArchiveLocation to, BiConsumer<String, Long> progress) {
        if (from.shared()) {
            throw new InputException(
                    InputException.Reason.INVALID,
                    "a migration copies an embedded archive, and the source named is the shared archive "
                            + from.shown(),
                    Remedy.of(Remedy.Kind.NAME_EMBEDDED_ARCHIVE));
        }
        if (!to.shared()) {
            throw new InputException(
                    InputException.Reason.INVALID,
                    "a migration copies into a shared archive on a PostgreSQL server, and " + to.shown()
                            + " is a folder");
        }
        long start = System.nanoTime();
        try (Archive source = Archive.open(from.dir());
                Archive target = Archive.openServer(to.server(), to.clientDir(), true, ArchiveLock.DEFAULT_WAIT)) {
            List<ArchiveTransfer.Copied> copied = ArchiveTransfer.copy(source, target, progress);
            return new Result(from, to, copied, (System.nanoTime() - start) / 1e9);
        }
    }
}
