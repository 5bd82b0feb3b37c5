package org.variset.app.search;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import org.variset.app.Document;
import org.variset.app.Json;
import org.variset.app.Workspace;
import org.variset.archive.read.ArchiveCatalog;
import org.variset.archive.read.HoldRecord;
import org.variset.archive.read.RouteFilter;
import org.variset.archive.read.RouteReader;
import org.variset.archive.read.RouteRecord;
import org.variset.archive.search.IndexProgress;
import org.variset.archive.search.SearchHits;
import org.variset.archive.search.SearchIndex;
import org.variset.archive.search.SearchRequest;
import org.variset.archive.search.SearchVocabulary;
import org.variset.reports.pdf.StudySheetPdf;

/**
 * Searches every route of the archive with the query language (docs in {@code SearchCommand}'s help and the README):
 * the index is brought up to date first, the query read with the vocabulary of the gym (or of every gym) today, and
 * the hits read back from the database in the index's order.
 */
public final class SearchRoutes {
    private final Workspace workspace;

    /** Searches a workspace's archive. */
    public SearchRoutes(Workspace workspace) {
        this.workspace = workspace;
    }

    /**
     * What a search found.
     *
     * @param request what was asked
     * @param hits the total, the ranked hits shown, and the facets when asked for
     * @param routes the routes of the hits, in rank order
     */
    public record Result(SearchRequest request, SearchHits hits, List<RouteRecord> routes) {
        /** The result for scripts. */
        public ObjectNode json() {
            ObjectNode o = Json.object()
                    .put("query", request.query())
                    .put("total", hits.total())
                    .put("shown", routes.size())
                    .put("sort", request.order().word());
            ArrayNode a = o.putArray("hits");
            for (int i = 0; i < routes.size(); i++) {
                route(a.addObject(), routes.get(i))
                        .put("score", hits.hits().get(i).score());
            }
            if (request.facets()) {
                ObjectNode f = o.putObject("facets");
                hits.facets().forEach((dim, values) -> {
                    ObjectNode d = f.putObject(dim);
                    values.forEach(v -> d.put(v.label(), v.count()));
                });
            }
            return o;
        }

        /** The routes found as a study sheet. */
        public Document studySheet() {
            return (options, out) -> StudySheetPdf.write(request.query(), hits.total(), routes, options, out);
        }
    }

    /** A route as JSON: its fields, setters, moves, styles and holds. */
    public static ObjectNode route(ObjectNode h, RouteRecord r) {
        h.put("id", r.id())
                .put("gym", r.gym())
                .put("wall", r.wall())
                .put("route", r.label())
                .put("discipline", r.discipline().word())
                .put("grade", r.gradeText())
                .put("ircra", r.ircra())
                .put("set_on", r.setOn().toString())
                .put("stripped_on", Json.date(r.strippedOn()));
        r.setters().forEach(h.putArray("setters")::add);
        r.moves().forEach(h.putArray("moves")::add);
        r.styles().forEach(h.putArray("styles")::add);
        ArrayNode holds = h.putArray("holds");
        for (HoldRecord x : r.holds()) {
            ObjectNode hold = holds.addObject()
                    .put("role", x.role().word())
                    .put("type", x.type())
                    .put("size", x.size() == null ? null : x.size().word())
                    .put("hold_ref", x.holdRef());
            x.grips().forEach(hold.putArray("grip")::add);
        }
        return h;
    }

    /**
     * Runs a search.
     *
     * @param progress hears of indexing when the index had to catch up
     * @throws org.variset.archive.search.QuerySyntaxException with the position of what cannot be read
     * @throws IllegalArgumentException for an unknown gym or a limit below 1
     */
    public Result search(SearchRequest request, IndexProgress progress) {
        if (request.limit() < 1) {
            throw new IllegalArgumentException("the limit must be at least 1");
        }
        if (request.gym() != null) {
            new ArchiveCatalog(workspace.archive().connection()).gym(request.gym());
        }
        try (SearchIndex index = workspace.currentIndex(progress)) {
            SearchHits hits = index.search(
                    request,
                    SearchVocabulary.of(
                            workspace.archive().connection(), request.gym(), workspace.today(request.gym())));
            List<RouteRecord> read = new RouteReader(workspace.archive().connection())
                    .read(RouteFilter.all()
                            .withIds(hits.hits().stream()
                                    .map(SearchHits.Hit::routeId)
                                    .toList()));
            Map<Long, RouteRecord> byId = new HashMap<>();
            read.forEach(r -> byId.put(r.id(), r));
            List<RouteRecord> inOrder = hits.hits().stream()
                    .map(h -> byId.get(h.routeId()))
                    .filter(Objects::nonNull)
                    .toList();
            return new Result(request, hits, inOrder);
        }
    }
}
