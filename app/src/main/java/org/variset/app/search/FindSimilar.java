package org.variset.app.search;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.time.LocalDate;
import org.variset.app.Json;
import org.variset.app.Workspace;
import org.variset.archive.read.ArchiveCatalog;
import org.variset.archive.read.GymRecord;
import org.variset.archive.read.RouteRecord;
import org.variset.archive.search.IndexProgress;
import org.variset.archive.search.SearchIndex;
import org.variset.reports.similar.SimilarRoutes;

/** The archived routes most like one route, by exact Jaccard index over the index's candidates. */
public final class FindSimilar {
    private final Workspace workspace;

    /** Finds similar routes in a workspace's archive. */
    public FindSimilar(Workspace workspace) {
        this.workspace = workspace;
    }

    /**
     * Which route to compare.
     *
     * @param gym the gym, or null when the archive holds one
     * @param label the route's label
     * @param wall its wall, or null when the label is unique
     * @param setOn its set date, or null when the label is unique
     */
    public record RouteName(String gym, String label, String wall, LocalDate setOn) {}

    /** A result for scripts. */
    public static ObjectNode json(SimilarRoutes.Result r) {
        ObjectNode o = Json.object()
                .put("route", r.route().name())
                .put("comparable", r.comparable())
                .put("candidates_scored", r.candidates());
        ArrayNode a = o.putArray("similar");
        for (SimilarRoutes.Match m : r.matches()) {
            ObjectNode x = a.addObject()
                    .put("route", m.other().name())
                    .put("gym", m.other().gym())
                    .put("jaccard", m.similarity().jaccard())
                    .put("shared_count", m.similarity().shared())
                    .put("union_count", m.similarity().union());
            m.similarity().sharedFeatures().forEach(x.putArray("shared")::add);
        }
        return o;
    }

    /**
     * The routes most like the named one, at most {@code limit}.
     *
     * @throws IllegalArgumentException when the name fits no route, or several (listed)
     */
    public SimilarRoutes.Result find(RouteName name, int limit) {
        try (SearchIndex index = workspace.currentIndex(IndexProgress.NONE)) {
            GymRecord g = new ArchiveCatalog(workspace.archive().connection()).gym(name.gym());
            SimilarRoutes similar = new SimilarRoutes(workspace.archive().connection());
            RouteRecord target = similar.route(g.name(), name.label(), name.wall(), name.setOn());
            return similar.find(target, index, g, Math.max(1, limit));
        }
    }
}
