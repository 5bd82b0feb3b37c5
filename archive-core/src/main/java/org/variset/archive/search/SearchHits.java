package org.variset.archive.search;

import java.util.List;
import java.util.Map;

/**
 * What a search found.
 *
 * @param total how many routes match
 * @param hits the first of them, in the order asked for
 * @param facets counts of the matching routes per dimension (move, hold, grip, band, wall, setter), largest first
 */
public record SearchHits(long total, List<Hit> hits, Map<String, List<FacetCount>> facets) {

    /**
     * One matching route.
     *
     * @param routeId its database id
     * @param score how well it matched (higher is better; equal for filters alone)
     */
    public record Hit(long routeId, float score) {}

    /**
     * One facet value.
     *
     * @param label the value as people read it
     * @param count how many matching routes have it
     */
    public record FacetCount(String label, long count) {}
}
