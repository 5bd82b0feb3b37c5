package org.variset.archive.change;

import java.util.List;
import org.hibernate.Session;
import org.variset.archive.changelog.ChangeLog;
import org.variset.archive.gym.Gym;
import org.variset.archive.gym.Unknown;
import org.variset.archive.route.Reset;
import org.variset.archive.route.Route;
import org.variset.archive.store.ArchiveQueries;
import org.variset.archive.store.GymLookup;
import org.variset.archive.store.Transaction;

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

    /** Which routes to take back. */
    public sealed interface Target {}

    /**
     * The routes of a reset.
     *
     * @param gym the gym, or null when the archive holds one
     * @param label the reset's label
     */
    public record OfReset(String gym, String label) implements Target {}

    /**
     * Routes named one by one (those of a routes file); the ones the archive does not hold are passed over.
     *
     * @param routes the routes
     */
    public record Listed(List<Named> routes) implements Target {}

    /**
     * A route by what identifies it.
     *
     * @param gym the gym, or null when the archive holds one
     * @param wall the wall
     * @param label the route's label
     * @param setOn the day it was set
     */
    public record Named(String gym, String wall, String label, java.time.LocalDate setOn) {}

    private RouteRemoval() {}

    /** What taking back the target would remove, without removing it. */
    public static Plan preview(Transaction tx, Target target) {
        return preview(tx.session(), routes(tx, target));
    }

    /** Removes the target's routes, their holds and the resets they empty, in the caller's transaction. */
    public static Plan remove(Transaction tx, Target target) {
        return remove(tx.session(), routes(tx, target));
    }

    private static List<Route> routes(Transaction tx, Target target) {
        GymLookup lookup = new GymLookup(tx);
        if (target instanceof OfReset r) {
            return ofReset(tx.session(), lookup.gym(r.gym()), r.label());
        }
        ArchiveQueries q = new ArchiveQueries(tx.session());
        java.util.List<Route> out = new java.util.ArrayList<>();
        for (Named n : ((Listed) target).routes()) {
            q.route(lookup.gym(n.gym()).name(), n.wall(), n.label(), n.setOn()).ifPresent(out::add);
        }
        return out;
    }

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
