package org.variset.app.archive;

import com.fasterxml.jackson.databind.node.ObjectNode;
import org.variset.app.Json;
import org.variset.app.Workspace;
import org.variset.archive.location.ArchiveLocation;
import org.variset.archive.store.ArchiveStats;

/** What an archive holds, read with plain JDBC (no Hibernate boot). */
public final class ArchiveInfo {
    private ArchiveInfo() {}

    /**
     * The archive and its counts.
     *
     * @param where where it is and why
     * @param stats what it holds
     */
    public record Result(ArchiveLocation where, ArchiveStats stats) {
        /** The result for scripts. */
        public ObjectNode json() {
            return Json.object()
                    .put("archive", where.shown())
                    .put("shared", where.shared())
                    .put("schema_version", stats.schemaVersion())
                    .put("gyms", stats.gyms())
                    .put("walls", stats.walls())
                    .put("resets", stats.resets())
                    .put("routes", stats.routes())
                    .put("holds", stats.holds())
                    .put("setters", stats.setters())
                    .put("first_set_on", Json.date(stats.firstSetOn()))
                    .put("last_set_on", Json.date(stats.lastSetOn()));
        }
    }

    /** What the workspace's archive holds. */
    public static Result of(Workspace w, ArchiveLocation where) {
        return new Result(where, w.archive().stats());
    }
}
