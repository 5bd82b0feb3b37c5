package org.variset.archive.change;

import java.util.List;
import org.hibernate.Session;
import org.variset.archive.changelog.ChangeLog;
import org.variset.archive.gym.Gym;
import org.variset.archive.gym.Unknown;
import org.variset.archive.route.Reset;
import org.variset.archive.route.Route;
import org.variset.archive.store.ArchiveQueries;

/**
 * Takes back a mistaken import: the routes of a reset, or a given list of routes, with their holds. A reset left
 * with no routes goes too. {@link #preview} says what would go so the user can confirm first.
 */
public final class RouteRemoval {

    /**
     * What goes (or went).
     *
     * @param routes one line per route ({@code wall label (set_on, grade)}), for the listing
     * @param holds how many hold placements go with them
     * @param emptiedResets resets left without routes, which go too
     */
    public record Plan(List<String> routes, long holds, List<String> emptiedResets) {}

    private RouteRemoval() {}

    /**
     * The routes of a reset, found by label.
     *
     * @throws IllegalArgumentException naming the gym's resets when the label is unknown
     */
    public static List<Route> ofReset(Session s, Gym gym, String label) {
        ArchiveQueries q = new ArchiveQueries(s);
        Reset reset = q.reset(gym, label).orElseThrow(() -> Unknown.reset(gym.name(), label, List.of()));
        return q.routesOfReset(reset);
    }

    /** What removing the routes would take away. */
    public static Plan preview(Session s, List<Route> routes) {
        if (routes.isEmpty()) {
            return new Plan(List.of(), 0, List.of());
        }
        long holds = s.createSelectionQuery("select count(h) from HoldPlacement h where h.route in :r", Long.class)
                .setParameter("r", routes)
                .getSingleResult();
        List<String> emptied = routes.stream()
                .map(Route::reset)
                .distinct()
                .filter(reset -> s.createSelectionQuery(
                                        "select count(r) from Route r where r.reset = :reset" + " and r not in :gone",
                                        Long.class)
                                .setParameter("reset", reset)
                                .setParameter("gone", routes)
                                .getSingleResult()
                        == 0)
                .map(Reset::label)
                .toList();
        List<String> lines = routes.stream()
                .map(r -> r.wall().name() + " " + r.label() + " (" + r.setOn() + ", " + r.gradeText() + ")")
                .toList();
        return new Plan(lines, holds, emptied);
    }

    /** Removes the routes, their holds and the resets they empty, in the caller's transaction. */
    public static Plan remove(Session s, List<Route> routes) {
        Plan plan = preview(s, routes);
        List<Reset> resets = routes.stream().map(Route::reset).distinct().toList();
        ChangeLog.routes(s, routes.stream().map(Route::id).toList());
        for (Route r : routes) {
            s.remove(r);
        }
        s.flush();
        for (Reset reset : resets) {
            if (plan.emptiedResets().contains(reset.label())) {
                s.remove(reset);
            }
        }
        return plan;
    }
}
