package org.variset.archive.read;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import org.variset.archive.grade.Discipline;

/**
 * Which routes to read. Every condition given must hold; an empty filter reads every route of the archive.
 *
 * @param gymId routes of this gym, or null
 * @param wallId routes of this wall, or null
 * @param resetId routes of this reset, or null
 * @param excludeResetId routes not of this reset, or null
 * @param setterId routes this setter set (among others), or null
 * @param discipline routes of this discipline, or null
 * @param standingOn routes up on this day, or null
 * @param setFrom routes set on or after this day, or null
 * @param setBefore routes set before this day (excluded), or null
 * @param upAfter routes not stripped by this day (stripped_on empty or after it), or null
 * @param ids only these routes, or null
 */
public record RouteFilter(
        Long gymId,
        Long wallId,
        Long resetId,
        Long excludeResetId,
        Long setterId,
        Discipline discipline,
        LocalDate standingOn,
        LocalDate setFrom,
        LocalDate setBefore,
        LocalDate upAfter,
        List<Long> ids) {

    /** Copies the id list. */
    public RouteFilter {
        ids = ids == null ? null : List.copyOf(ids);
    }

    /** Every route. */
    public static RouteFilter all() {
        return new RouteFilter(null, null, null, null, null, null, null, null, null, null, null);
    }

    /** The routes of a gym. */
    public static RouteFilter gym(long gymId) {
        return all().withGym(gymId);
    }

    /** The routes of a reset. */
    public static RouteFilter reset(long resetId) {
        return all().withReset(resetId);
    }

    /** Only this gym's routes. */
    public RouteFilter withGym(long id) {
        return new RouteFilter(
                id,
                wallId,
                resetId,
                excludeResetId,
                setterId,
                discipline,
                standingOn,
                setFrom,
                setBefore,
                upAfter,
                ids);
    }

    /** Only this wall's routes. */
    public RouteFilter withWall(long id) {
        return new RouteFilter(
                gymId, id, resetId, excludeResetId, setterId, discipline, standingOn, setFrom, setBefore, upAfter, ids);
    }

    /** Only this reset's routes. */
    public RouteFilter withReset(long id) {
        return new RouteFilter(
                gymId, wallId, id, excludeResetId, setterId, discipline, standingOn, setFrom, setBefore, upAfter, ids);
    }

    /** Not this reset's routes. */
    public RouteFilter withoutReset(long id) {
        return new RouteFilter(
                gymId, wallId, resetId, id, setterId, discipline, standingOn, setFrom, setBefore, upAfter, ids);
    }

    /** Only routes this setter set. */
    public RouteFilter withSetter(long id) {
        return new RouteFilter(
                gymId, wallId, resetId, excludeResetId, id, discipline, standingOn, setFrom, setBefore, upAfter, ids);
    }

    /** Only routes of this discipline. */
    public RouteFilter withDiscipline(Discipline d) {
        return new RouteFilter(
                gymId, wallId, resetId, excludeResetId, setterId, d, standingOn, setFrom, setBefore, upAfter, ids);
    }

    /** Only routes up on the day. */
    public RouteFilter standingOn(LocalDate d) {
        return new RouteFilter(
                gymId, wallId, resetId, excludeResetId, setterId, discipline, d, setFrom, setBefore, upAfter, ids);
    }

    /** Only routes set in [from, before). */
    public RouteFilter setBetween(LocalDate from, LocalDate before) {
        return new RouteFilter(
                gymId, wallId, resetId, excludeResetId, setterId, discipline, standingOn, from, before, upAfter, ids);
    }

    /** Only routes up at some point in [from, to]: set on or before to, and not stripped by from. */
    public RouteFilter upBetween(LocalDate from, LocalDate to) {
        return new RouteFilter(
                gymId,
                wallId,
                resetId,
                excludeResetId,
                setterId,
                discipline,
                standingOn,
                setFrom,
                to.plusDays(1),
                from,
                ids);
    }

    /** Only the routes with these ids (at most a few thousand: one SQL parameter each). */
    public RouteFilter withIds(List<Long> routeIds) {
        return new RouteFilter(
                gymId,
                wallId,
                resetId,
                excludeResetId,
                setterId,
                discipline,
                standingOn,
                setFrom,
                setBefore,
                upAfter,
                routeIds);
    }

    /** The SQL condition on the route table aliased {@code r}, with its parameters in order. */
    String where(List<Object> params) {
        List<String> c = new ArrayList<>();
        add(c, params, gymId, "r.gym_id = ?");
        add(c, params, wallId, "r.wall_id = ?");
        add(c, params, resetId, "r.reset_id = ?");
        add(c, params, excludeResetId, "r.reset_id <> ?");
        add(c, params, setterId, "EXISTS (SELECT 1 FROM route_setter x WHERE x.route_id = r.id AND x.setter_id = ?)");
        add(c, params, discipline == null ? null : discipline.name(), "r.discipline = ?");
        if (standingOn != null) {
            c.add("r.set_on <= ? AND (r.stripped_on IS NULL OR r.stripped_on > ?)");
            params.add(standingOn);
            params.add(standingOn);
        }
        add(c, params, setFrom, "r.set_on >= ?");
        add(c, params, setBefore, "r.set_on < ?");
        add(c, params, upAfter, "(r.stripped_on IS NULL OR r.stripped_on > ?)");
        if (ids != null) {
            c.add(
                    ids.isEmpty()
                            ? "1 = 0"
                            : "r.id IN (" + String.join(", ", java.util.Collections.nCopies(ids.size(), "?")) + ")");
            params.addAll(ids);
        }
        return c.isEmpty() ? "1 = 1" : String.join(" AND ", c);
    }

    private static void add(List<String> conditions, List<Object> params, Object value, String sql) {
        if (value != null) {
            conditions.add(sql);
            params.add(value);
        }
    }
}
