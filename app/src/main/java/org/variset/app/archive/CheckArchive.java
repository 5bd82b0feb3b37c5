package org.variset.app.archive;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.variset.app.Json;
import org.variset.app.Workspace;
import org.variset.archive.check.ArchiveCheck;
import org.variset.archive.check.CheckReport;
import org.variset.archive.search.IndexProgress;
import org.variset.archive.search.SearchIndex;

/** Checks the archive's database and search index, and rebuilds the index when asked and needed. */
public final class CheckArchive {
    private CheckArchive() {}

    /**
     * What the check found.
     *
     * @param report every check, in the order run (after the repair, when there was one)
     * @param repaired true when the index was rebuilt
     */
    public record Result(CheckReport report, boolean repaired) {
        /** The result for scripts. */
        public ObjectNode json() {
            ObjectNode o = Json.object().put("healthy", report.healthy()).put("index_rebuilt", repaired);
            ArrayNode a = o.putArray("checks");
            report.items()
                    .forEach(i -> a.addObject()
                            .put("part", i.part())
                            .put("check", i.name())
                            .put("ok", i.ok())
                            .put("note", i.note())
                            .put("detail", i.detail()));
            return o;
        }
    }

    /** Checks; with {@code repair}, rebuilds an index that is not sound when the database is. */
    public static Result run(Workspace w, boolean repair) {
        try (SearchIndex index = SearchIndex.of(w.archive())) {
            CheckReport report = ArchiveCheck.run(w.archive(), index);
            if (repair && !report.healthy() && report.databaseHealthy()) {
                index.rebuild(w.archive().connection(), IndexProgress.NONE, "repair asked for");
                return new Result(ArchiveCheck.run(w.archive(), index), true);
            }
            return new Result(report, false);
        }
    }
}
