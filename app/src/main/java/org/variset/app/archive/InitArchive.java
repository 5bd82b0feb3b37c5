package org.variset.app.archive;

import com.fasterxml.jackson.databind.node.ObjectNode;
import org.variset.app.Json;
import org.variset.archive.location.ArchiveLocation;
import org.variset.archive.store.Archive;
import org.variset.archive.store.ArchiveLock;

/** Creates an empty archive where a location says, or finds the one already there and changes nothing. */
public final class InitArchive {
    private InitArchive() {}

    /**
     * What was found or made.
     *
     * @param where the location
     * @param created true when this run made the archive
     * @param schemaVersion its schema version
     */
    public record Result(ArchiveLocation where, boolean created, int schemaVersion) {
        /** The result for scripts. */
        public ObjectNode json() {
            return Json.object()
                    .put("archive", where.shown())
                    .put("created", created)
                    .put("schema_version", schemaVersion);
        }
    }

    /**
     * Creates the archive, or opens the one there (a shared archive's tables are made in its empty database).
     *
     * @throws org.variset.archive.problem.ArchiveException when it cannot be created or opened
     */
    public static Result at(ArchiveLocation where) {
        if (where.shared()) {
            try (Archive a = Archive.openServer(where.server(), where.clientDir(), true, ArchiveLock.DEFAULT_WAIT)) {
                return new Result(where, a.wasCreated(), a.schemaVersion().version());
            }
        }
        boolean existed = Archive.existsAt(where.dir());
        try (Archive a = existed ? Archive.open(where.dir()) : Archive.create(where.dir())) {
            return new Result(where, !existed, a.schemaVersion().version());
        }
    }
}
