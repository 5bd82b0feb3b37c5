package org.variset.archive.store;

import java.time.LocalDate;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import org.hibernate.Session;
import org.variset.archive.gym.Gym;
import org.variset.archive.gym.Wall;
import org.variset.archive.route.Reset;
import org.variset.archive.route.Route;

/**
 * The questions the rest of Variset asks of the archive, each backed by an index of the V1 schema (named
 * beside each query). Standing on date d means set_on &lt;= d and (stripped_on is null or d &lt; stripped_on).
 */
public final class ArchiveQueries {
    private final Session session;

    /** Queries in one session. */
    public ArchiveQueries(Session session) {
        this.session = Objects.requireNonNull(session, "session");
    }

    /** The gym of that name. */
    public Optional<Gym> gym(String name) {
        return session.createSelectionQuery("from Gym where name = :name", Gym.class)
                .setParameter("name", name.strip())
                .uniqueResultOptional();
    }

    /** Every gym, by name. */
    public List<Gym> gyms() {
        return session.createSelectionQuery("from Gym order by name", Gym.class).getResultList();
    }

    /** The wall of that name in the gym (unique index wall_name_unique). */
    public Optional<Wall> wall(Gym gym, String name) {
        return session.createSelectionQuery("from Wall where gym = :gym and name = :name", Wall.class)
                .setParameter("gym", gym)
                .setParameter("name", name.strip())
                .uniqueResultOptional();
    }

    /** The walls of a gym, by name. */
    public List<Wall> walls(Gym gym) {
        return session.createSelectionQuery("from Wall where gym = :gym order by name", Wall.class)
                .setParameter("gym", gym)
                .getResultList();
    }

    /** The reset with that label in the gym (unique index reset_label_unique). */
    public Optional<Reset> reset(Gym gym, String label) {
        return session.createSelectionQuery("from Reset where gym = :gym and label = :label", Reset.class)
                .setParameter("gym", gym)
                .setParameter("label", label.strip())
                .uniqueResultOptional();
    }

    /** The resets of a wall in date order, then label (index reset_wall_date). */
    public List<Reset> resetsOfWall(Wall wall) {
        return session.createSelectionQuery("from Reset where wall = :wall order by resetOn, label", Reset.class)
                .setParameter("wall", wall)
                .getResultList();
    }

    /** The latest reset of a wall on or before a date (index reset_wall_date). */
    public Optional<Reset> latestResetOnOrBefore(Wall wall, LocalDate date) {
        return session.createSelectionQuery(
                        "from Reset where wall = :wall and resetOn <= :d" + " order by resetOn desc, label desc",
                        Reset.class)
                .setParameter("wall", wall)
                .setParameter("d", date)
                .setMaxResults(1)
                .uniqueResultOptional();
    }

    /** The routes of a reset, by set_on then label (index route_reset). */
    public List<Route> routesOfReset(Reset reset) {
        return session.createSelectionQuery("from Route where reset = :reset order by setOn, label", Route.class)
                .setParameter("reset", reset)
                .getResultList();
    }

    /** The routes of a gym standing on a date (index route_gym_set_on). */
    public List<Route> standingSet(Gym gym, LocalDate d) {
        return session.createSelectionQuery(
                        "from Route where gym = :gym and setOn <= :d"
                                + " and (strippedOn is null or strippedOn > :d) order by wall.name, setOn, label",
                        Route.class)
                .setParameter("gym", gym)
                .setParameter("d", d)
                .getResultList();
    }

    /** The routes of a wall standing on a date (index route_wall_set_on). */
    public List<Route> standingSet(Wall wall, LocalDate d) {
        return session.createSelectionQuery(
                        "from Route where wall = :wall and setOn <= :d"
                                + " and (strippedOn is null or strippedOn > :d) order by setOn, label",
                        Route.class)
                .setParameter("wall", wall)
                .setParameter("d", d)
                .getResultList();
    }

    /** The routes of a gym set in a date window, both ends included (index route_gym_set_on). */
    public List<Route> routesSetBetween(Gym gym, LocalDate from, LocalDate to) {
        return session.createSelectionQuery(
                        "from Route where gym = :gym and setOn between :from and :to"
                                + " order by setOn, wall.name, label",
                        Route.class)
                .setParameter("gym", gym)
                .setParameter("from", from)
                .setParameter("to", to)
                .getResultList();
    }

    /** The route with that key, named by gym and wall names (unique index route_key_unique). */
    public Optional<Route> route(String gym, String wall, String label, LocalDate setOn) {
        return session.createSelectionQuery(
                        "from Route r where r.gym.name = :g and r.wall.name = :w"
                                + " and r.label = :l and r.setOn = :s",
                        Route.class)
                .setParameter("g", gym)
                .setParameter("w", wall)
                .setParameter("l", label)
                .setParameter("s", setOn)
                .uniqueResultOptional();
    }

    /** The route with that key (unique index route_key_unique). */
    public Optional<Route> route(Wall wall, String label, LocalDate setOn) {
        return session.createSelectionQuery(
                        "from Route where wall = :wall and label = :label and setOn = :s", Route.class)
                .setParameter("wall", wall)
                .setParameter("label", label.strip())
                .setParameter("s", setOn)
                .uniqueResultOptional();
    }
}
