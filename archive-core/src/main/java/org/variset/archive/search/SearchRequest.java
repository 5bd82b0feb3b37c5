package org.variset.archive.search;

import java.time.LocalDate;

/**
 * A search: the query people typed and the filters of the command line.
 *
 * @param query the query in the query language
 * @param gym only this gym's routes, or null
 * @param wall only routes on walls of this name, or null
 * @param standingOn only routes up on this day, or null
 * @param order how hits are ordered
 * @param limit how many hits to return, at least 1
 * @param facets whether to count the matching routes by move, hold type, grip, band, wall and setter
 */
public record SearchRequest(
        String query, String gym, String wall, LocalDate standingOn, SearchOrder order, int limit, boolean facets) {

    /** Checks the limit. */
    public SearchRequest {
        if (limit < 1) {
            throw new IllegalArgumentException("the limit must be at least 1 (it was " + limit + ")");
        }
    }
}
