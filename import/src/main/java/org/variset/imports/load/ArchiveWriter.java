package org.variset.imports.load;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.hibernate.Session;
import org.variset.archive.gym.Gym;
import org.variset.archive.gym.Wall;
import org.variset.archive.route.HoldPlacement;
import org.variset.archive.route.Reset;
import org.variset.archive.route.Route;
import org.variset.archive.route.Setter;
import org.variset.archive.store.ArchiveQueries;
import org.variset.archive.store.ChangeLog;
import org.variset.imports.row.HoldRow;
import org.variset.imports.row.RouteKey;
import org.variset.imports.row.RouteRow;
import org.variset.imports.row.RowParser;
import org.variset.imports.row.WallRow;
import org.variset.imports.table.RowCursor;
import org.variset.imports.table.RowSource;
import org.variset.imports.table.TableKind;

/**
 * Writes a checked import plan in the caller's transaction. The session is flushed and cleared in chunks so that
 * memory does not grow with the file; entities are found again by id after each clear.
 */
final class ArchiveWriter {
    private static final int ROUTE_CHUNK = 500;
    private static final int HOLD_CHUNK = 2_000;

    private final Session session;
    private final ImportPlan plan;
    private final RowParser quiet;
    private final Map<String, Long> gyms = new HashMap<>();
    private final Map<List<String>, Long> walls = new HashMap<>();
    private final Map<List<String>, Long> resets = new HashMap<>();
    private final Map<String, Long> setters = new HashMap<>();
    private final Map<RouteKey, Long> routeIds = new HashMap<>();
    private int wallsCreated;

    ArchiveWriter(Session session, ImportPlan plan, RowParser quiet) {
        this.session = session;
        this.plan = plan;
        this.quiet = quiet;
    }

    /** Writes walls, routes and holds, and records the routes written in the change log; returns holds written. */
    long write(List<RowSource> sources, RouteResolver resolver, ImportProgress progress) {
        long holds = writeRoutesAndHolds(sources, resolver, progress);
        java.util.Set<Long> changed = new java.util.TreeSet<>();
        for (RouteKey k : plan.routes.keySet()) {
            if (!plan.refused.contains(k) && (plan.newRoutes.contains(k) || plan.changedRoutes.contains(k)
                    && plan.options.update())) {
                changed.add(routeId(k));
            }
        }
        for (RouteKey k : plan.keysWithHolds()) {
            if (plan.writesHoldsOf(k)) {
                changed.add(routeId(k));
            }
        }
        ChangeLog.routes(session, changed);
        return holds;
    }

    private long writeRoutesAndHolds(List<RowSource> sources, RouteResolver resolver, ImportProgress progress) {
        for (WallRow w : plan.walls.values()) {
            Wall wall = wall(w.gym(), w.wall());
            List<String> key = List.of(w.gym(), w.wall());
            if (plan.newWalls.contains(key) || plan.changedWalls.contains(key) && plan.options.update()) {
                wall.describe(w.discipline(), w.angleDeg(), w.heightM(), w.widthM(), w.cycleDays());
                wall.setExtraFields(w.extraFields());
            }
        }
        int n = 0;
        java.util.Set<RouteKey> written = new java.util.HashSet<>();
        for (RowSource s : sources) {
            if (s.kind() != TableKind.ROUTES) {
                continue;
            }
            try (RowCursor c = s.rows()) {
                while (c.hasNext()) {
                    RouteRow row = quiet.route(c.next());
                    RouteKey k = row == null ? null : plan.intern(row.key());
                    ImportPlan.PlannedRoute p = k == null ? null : plan.routes.get(k);
                    if (p == null || !p.from(row) || plan.refused.contains(k) || !written.add(k)) {
                        continue;
                    }
                    if (writeRoute(k, row) && ++n % ROUTE_CHUNK == 0) {
                        session.flush();
                        session.clear();
                    }
                }
            }
        }
        session.flush();
        session.clear();
        return writeHolds(sources, resolver, progress);
    }

    /** Writes one route row when it is new, or changed and updated; true when it wrote. */
    private boolean writeRoute(RouteKey k, RouteRow row) {
        if (plan.newRoutes.contains(k)) {
            Route r = new Route(reset(row), k.label(), k.setOn(), row.discipline(), row.grade());
            fill(r, row);
            session.persist(r);
            routeIds.put(k, r.id());
            return true;
        }
        if (plan.changedRoutes.contains(k) && plan.options.update()) {
            Route r = find(k);
            r.setGrade(row.grade());
            r.setReset(reset(row));
            fill(r, row);
            return true;
        }
        return false;
    }

    private long writeHolds(List<RowSource> sources, RouteResolver resolver, ImportProgress progress) {
        Map<RouteKey, Integer> ordinals = new HashMap<>();
        for (RouteKey k : plan.keysWithHolds()) {
            if (plan.writesHoldsOf(k)) {
                long id = routeId(k);
                if (!plan.newRoutes.contains(k)) {
                    session.createMutationQuery("delete from HoldPlacement h where h.route.id = :id")
                            .setParameter("id", id).executeUpdate();
                }
            }
        }
        long written = 0;
        for (RowSource s : sources) {
            if (s.kind() != TableKind.HOLDS) {
                continue;
            }
            try (RowCursor c = s.rows()) {
                while (c.hasNext()) {
                    HoldRow h = quiet.hold(c.next());
                    RouteKey k = h == null ? null : resolver.resolve(h, null);
                    if (k == null || !plan.writesHoldsOf(k)) {
                        continue;
                    }
                    int ordinal = ordinals.merge(k, 1, Integer::sum) - 1;
                    Route ref = session.getReference(Route.class, routeId(k));
                    session.persist(HoldPlacement.placedOn(ref, ordinal, h.spec()));
                    if (++written % HOLD_CHUNK == 0) {
                        session.flush();
                        session.clear();
                        progress.advanced("writing holds", written);
                    }
                }
            }
        }
        session.flush();
        session.clear();
        return written;
    }

    /** Walls the write created, named in a walls file or only in a routes file. */
    int wallsCreated() {
        return wallsCreated;
    }

    private void fill(Route r, RouteRow row) {
        r.setStrippedOn(row.strippedOn());
        r.setSetters(row.setters().stream().map(this::setter).toList());
        r.setColor(row.color());
        r.setAngleDeg(row.angleDeg());
        r.setMoves(row.moves());
        r.setStyles(row.styles());
        r.setMoveDifficulty(row.moveDifficulty());
        r.setNotes(row.notes());
        r.setExtraFields(row.extraFields());
    }

    private long routeId(RouteKey k) {
        return routeIds.computeIfAbsent(k, key -> find(key).id());
    }

    private Route find(RouteKey k) {
        return new ArchiveQueries(session).route(k.gym(), k.wall(), k.label(), k.setOn()).orElse(null);
    }

    private Gym gym(String name) {
        Long id = gyms.computeIfAbsent(name, n -> session.createSelectionQuery("select g.id from Gym g"
                + " where g.name = :n", Long.class).setParameter("n", n).uniqueResultOptional().orElseGet(() -> {
                    Gym g = new Gym(n, plan.options.newGymZone());
                    session.persist(g);
                    return g.id();
                }));
        return session.get(Gym.class, id);
    }

    private Wall wall(String gymName, String name) {
        Long id = walls.computeIfAbsent(List.of(gymName, name), k -> session.createSelectionQuery(
                "select w.id from Wall w where w.gym.name = :g and w.name = :n", Long.class)
                .setParameter("g", gymName).setParameter("n", name).uniqueResultOptional().orElseGet(() -> {
                    Wall w = new Wall(gym(gymName), name);
                    session.persist(w);
                    wallsCreated++;
                    return w.id();
                }));
        return session.get(Wall.class, id);
    }

    private Reset reset(RouteRow row) {
        RouteKey k = row.key();
        Long id = resets.computeIfAbsent(List.of(k.gym(), row.reset()), key -> session.createSelectionQuery(
                "select r.id from Reset r where r.gym.name = :g and r.label = :l", Long.class)
                .setParameter("g", k.gym()).setParameter("l", row.reset()).uniqueResultOptional().orElseGet(() -> {
                    Reset r = new Reset(wall(k.gym(), k.wall()), row.reset(), k.setOn());
                    session.persist(r);
                    return r.id();
                }));
        return session.get(Reset.class, id);
    }

    private Setter setter(String name) {
        Long id = setters.computeIfAbsent(name, n -> session.createSelectionQuery("select s.id from Setter s"
                + " where s.name = :n", Long.class).setParameter("n", n).uniqueResultOptional().orElseGet(() -> {
                    Setter s = new Setter(n);
                    session.persist(s);
                    return s.id();
                }));
        return session.get(Setter.class, id);
    }
}
