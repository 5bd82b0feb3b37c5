package org.variset.archive.change;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import org.hibernate.Session;
import org.variset.archive.changelog.ChangeLog;
import org.variset.archive.gym.Wall;
import org.variset.archive.route.Route;
import org.variset.archive.store.GymLookup;
import org.variset.archive.store.Transaction;

/**
 * Takes a wall's old routes down when it is reset: every route of the wall set before the date and still up
 * that day gets the date as its strip date; routes set on the date are the new set and stay.
 */
public final class WallStrip {

    /**
     * What a strip did.
     *
     * @param stripped routes marked as stripped on the date
     * @param setThatDay routes set on the date, left up
     * @param alreadyDown routes set before the date that were already down
     */
    public record Result(int stripped, int setThatDay, int alreadyDown) {}

    private WallStrip() {}

    /**
     * Strips the named wall on a date, in the caller's transaction.
     *
     * @param gym the gym, or null when the archive holds one
     * @throws IllegalArgumentException naming what there is when the gym or wall is unknown
     */
    public static Result strip(Transaction tx, String gym, String wall, LocalDate on) {
        GymLookup lookup = new GymLookup(tx);
        return strip(tx.session(), lookup.wall(lookup.gym(gym), wall), on);
    }

    /** Strips the wall on a date, in the caller's transaction. */
    public static Result strip(Session session, Wall wall, LocalDate on) {
        List<Route> routes = session.createSelectionQuery("from Route where wall = :w and setOn <= :d", Route.class)
                .setParameter("w", wall)
                .setParameter("d", on)
                .getResultList();
        int stripped = 0;
        int same = 0;
        int down = 0;
        List<Long> changed = new ArrayList<>();
        for (Route r : routes) {
            if (r.setOn().equals(on)) {
                same++;
            } else if (r.standingOn(on)) {
                r.setStrippedOn(on);
                changed.add(r.id());
                stripped++;
            } else {
                down++;
            }
        }
        ChangeLog.routes(session, changed);
        return new Result(stripped, same, down);
    }
}
