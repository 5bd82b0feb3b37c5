package org.variset.web.page;

import io.javalin.config.RoutesConfig;
import io.javalin.http.Context;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.variset.app.account.Account;
import org.variset.app.search.SearchRoutes;
import org.variset.archive.read.RouteRecord;
import org.variset.archive.search.IndexProgress;
import org.variset.archive.search.QuerySyntaxException;
import org.variset.archive.search.SearchHits;
import org.variset.archive.search.SearchOrder;
import org.variset.archive.search.SearchRequest;
import org.variset.web.security.Guard;
import org.variset.web.security.Need;

/** Search over the archive with the query language of {@code variset search}, its facets and its sort orders. */
public final class SearchPages {
    private static final int LIMIT = 50;

    private final Site site;

    /** Search pages of a site. */
    public SearchPages(Site site) {
        this.site = site;
    }

    /**
     * A result.
     *
     * @param title the route's label, wall and day
     * @param grade its grade
     * @param gym its gym
     * @param setters who set it
     * @param moves its moves
     * @param link its page
     */
    public record Hit(String title, String grade, String gym, String setters, String moves, String link) {}

    /**
     * A facet's value.
     *
     * @param label the value
     * @param count how many results have it
     * @param link the search narrowed to it
     */
    public record FacetValue(String label, long count, String link) {}

    /**
     * A facet.
     *
     * @param name move, hold, grip, band, wall, setter
     * @param values its values, most common first
     */
    public record Facet(String name, List<FacetValue> values) {}

    /**
     * The page.
     *
     * @param query the query as typed
     * @param order the sort order's word
     * @param error what cannot be read in the query, or empty
     * @param pointer the query with a caret under the place, or empty
     * @param total how many routes match
     * @param hits the results shown
     * @param facets the facets
     * @param searched false before a query was typed
     */
    public record SearchView(
            String query,
            String order,
            String error,
            String pointer,
            long total,
            List<Hit> hits,
            List<Facet> facets,
            boolean searched) {}

    /** Registers the routes. */
    public void register(RoutesConfig r) {
        r.get("/search", this::page, Need.VIEWER);
    }

    private void page(Context ctx) {
        String q = ctx.queryParam("q") == null ? "" : ctx.queryParam("q").strip();
        SearchOrder order = order(ctx.queryParam("sort"));
        String word = order.word();
        if (q.isEmpty()) {
            site.page(
                    ctx,
                    "search.jte",
                    "Search",
                    "view",
                    new SearchView("", word, "", "", 0, List.of(), List.of(), false));
            return;
        }
        Account a = Guard.account(ctx);
        String gym = a.gyms().isEmpty() ? null : a.gyms().get(0);
        SearchView v;
        try {
            SearchRoutes.Result r = site.gate()
                    .use(w -> new SearchRoutes(w)
                            .search(new SearchRequest(q, gym, null, null, order, LIMIT, true), IndexProgress.NONE));
            List<Hit> hits = new ArrayList<>();
            for (RouteRecord route : r.routes()) {
                hits.add(new Hit(
                        RoutePages.title(route),
                        route.gradeText(),
                        route.gym(),
                        String.join(", ", route.setters()),
                        String.join(", ", route.moves()),
                        Links.route(route.id())));
            }
            v = new SearchView(q, word, "", "", r.hits().total(), hits, facets(q, word, r.hits()), true);
        } catch (QuerySyntaxException e) {
            v = new SearchView(q, word, e.getMessage(), e.pointer(), 0, List.of(), List.of(), true);
        }
        site.page(ctx, "search.jte", "Search: " + q, "view", v);
    }

    private static SearchOrder order(String sort) {
        if (sort == null) {
            return SearchOrder.RELEVANCE;
        }
        for (SearchOrder o : SearchOrder.values()) {
            if (o.word().equals(sort.strip().toLowerCase(Locale.ROOT))) {
                return o;
            }
        }
        return SearchOrder.RELEVANCE;
    }

    private static List<Facet> facets(String q, String order, SearchHits hits) {
        List<Facet> out = new ArrayList<>();
        for (Map.Entry<String, List<SearchHits.FacetCount>> e : hits.facets().entrySet()) {
            List<FacetValue> values = new ArrayList<>();
            for (SearchHits.FacetCount c : e.getValue()) {
                String term =
                        e.getKey() + ":" + (c.label().matches("[\\p{L}\\p{N}+._-]+") ? c.label() : quote(c.label()));
                values.add(new FacetValue(c.label(), c.count(), Links.search(q + " " + term) + "&sort=" + order));
            }
            if (!values.isEmpty()) {
                out.add(new Facet(e.getKey(), values));
            }
        }
        return out;
    }

    private static String quote(String s) {
        return "\"" + s.replace("\"", "") + "\"";
    }
}
