package org.variset.imports.load;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import org.hibernate.Session;
import org.variset.archive.bulk.BulkInserts;
import org.variset.archive.bulk.OverlappedChunks;
import org.variset.archive.changelog.ChangeLog;
import org.variset.archive.gym.Gym;
import org.variset.archive.gym.Wall;
import org.variset.archive.problem.ArchiveException;
import org.variset.archive.route.HoldPlacement;
import org.variset.archive.route.Reset;
import org.variset.archive.route.Route;
import org.variset.archive.route.Setter;
import org.variset.archive.store.ArchiveQueries;
import org.variset.imports.row.HoldRow;
import org.variset.imports.row.RouteKey;
import org.variset.imports.row.RouteRow;
import org.variset.imports.row.RowParser;
import org.variset.imports.row.WallRow;
import org.variset.imports.table.RowCursor;
import org.variset.imports.table.RowSource;
import org.variset.imports.table.TableKind;

/**
 * Writes a checked import plan in the caller's transaction. Gyms and walls (a few) go through Hibernate; new resets,
 * setters, routes and holds (the bulk) through {@link BulkInserts} on the session's own connection, so they share
 * its transaction; a changed route that is updated goes through its entity again. Rows are read again from the files,
 * so memory does not grow with what the routes hold.
 */
final class ArchiveWriter {
    private static final int PROGRESS_EVERY = 2_000;
    /** Holds handed to the writing thread at a time. */
    private static final int HOLD_CHUNK = 2_000;

    private final Session session;
    private final ImportPlan plan;
    private final RowParser quiet;
    /** Walls by gym and name: their ids and a detached entity to build transient resets on. */
    private final Map<List<String>, WallRef> walls = new HashMap<>();
    /** Resets by gym and label. */
    private final Map<List<String>, ResetRef> resets = new HashMap<>();

    private final Map<String, Long> setters = new HashMap<>();
    private final Map<RouteKey, Long> routeIds = new HashMap<>();

    private record WallRef(long gymId, long wallId, Wall entity) {}

    /** A reset: its ids, its date so far, and a transient entity for building transient routes on. */
    private static final class ResetRef {
        final long id;
        final long wallId;
        final Reset entity;
        LocalDate on;

        ResetRef(long id, long wallId, Reset entity, LocalDate on) {
            this.id = id;
            this.wallId = wallId;
            this.entity = entity;
            this.on = on;
        }
    }

    ArchiveWriter(Session session, ImportPlan plan, RowParser quiet) {
        this.session = session;
        this.plan = plan;
        this.quiet = quiet;
    }

    /** Writes walls, routes and holds, and records the routes written in the change log; returns holds written. */
    long write(
            List<RowSource> sources, RouteResolver resolver, ImportProgress progress, ArchiveImporter.Stopwatch clock) {
        writeWalls();
        Connection c = session.doReturningWork(x -> x);
        long holds;
        try (BulkInserts bulk = new BulkInserts(c)) {
            loadResets(c);
            loadSetters(c);
            writeRoutes(sources, bulk);
            bulk.flush();
            clock.lap("writing routes");
            holds = writeHolds(c, sources, resolver, bulk, progress);
        } catch (SQLException e) {
            throw writeFailure(e);
        }
        Set<Long> changed = new TreeSet<>();
        for (RouteKey k : plan.routes.keySet()) {
            if (writesRoute(k)) {
                changed.add(routeId(k));
            }
        }
        for (RouteKey k : plan.keysWithHolds()) {
            if (plan.writesHoldsOf(k)) {
                changed.add(routeId(k));
            }
        }
        clock.lap("writing holds");
        ChangeLog.routes(session, changed);
        clock.lap("recording the change log");
        return holds;
    }

    /** Walls the write created, named in a walls file or only in a routes file. */
    private boolean writesRoute(RouteKey k) {
        return !plan.refused.contains(k)
                && (plan.newRoutes.contains(k) || plan.changedRoutes.contains(k) && plan.options.update());
    }

    /** Creates and describes walls with Hibernate: those of the walls files and those new routes name. */
    private void writeWalls() {
        for (WallRow w : plan.walls.values()) {
            List<String> key = List.of(w.gym(), w.wall());
            Wall wall = wall(key);
            if (plan.newWalls.contains(key) || plan.changedWalls.contains(key) && plan.options.update()) {
                wall.describe(w.discipline(), w.angleDeg(), w.heightM(), w.widthM(), w.cycleDays());
                wall.setExtraFields(w.extraFields());
            }
        }
        Set<List<String>> named = new LinkedHashSet<>();
        for (RouteKey k : plan.routes.keySet()) {
            if (writesRoute(k)) {
                named.add(List.of(k.gym(), k.wall()));
            }
        }
        named.forEach(this::wall);
        session.flush();
    }

    private Wall wall(List<String> key) {
        WallRef ref = walls.get(key);
        if (ref != null) {
            return ref.entity();
        }
        Wall w = session.createSelectionQuery(
                        "from Wall w join fetch w.gym where w.gym.name = :g and w.name = :n", Wall.class)
                .setParameter("g", key.get(0))
                .setParameter("n", key.get(1))
                .uniqueResultOptional()
                .orElseGet(() -> {
                    Wall created = new Wall(gym(key.get(0)), key.get(1));
                    session.persist(created);
                    return created;
                });
        walls.put(key, new WallRef(w.gym().id(), w.id(), w));
        return w;
    }

    private Gym gym(String name) {
        return session.createSelectionQuery("from Gym g where g.name = :n", Gym.class)
                .setParameter("n", name)
                .uniqueResultOptional()
                .orElseGet(() -> {
                    Gym g = new Gym(name, plan.options.newGymZone());
                    session.persist(g);
                    session.flush();
                    return g;
                });
    }

    /** The stored resets of the gyms written to. */
    private void loadResets(Connection c) throws SQLException {
        Map<Long, String> gymNames = new HashMap<>();
        Map<Long, WallRef> wallsById = new HashMap<>();
        walls.forEach((k, w) -> {
            gymNames.put(w.gymId(), k.get(0));
            wallsById.put(w.wallId(), w);
        });
        try (PreparedStatement s = c.prepareStatement("SELECT r.id, r.label, r.reset_on, r.wall_id, w.name FROM reset r"
                + " JOIN wall w ON w.id = r.wall_id WHERE r.gym_id = ?")) {
            for (Map.Entry<Long, String> g : gymNames.entrySet()) {
                s.setLong(1, g.getKey());
                try (ResultSet r = s.executeQuery()) {
                    while (r.next()) {
                        long wallId = r.getLong(4);
                        WallRef w = wallsById.get(wallId);
                        Wall wall = w != null ? w.entity() : wall(List.of(g.getValue(), r.getString(5)));
                        LocalDate on = r.getDate(3).toLocalDate();
                        resets.put(
                                List.of(g.getValue(), r.getString(2)),
                                new ResetRef(r.getLong(1), wallId, new Reset(wall, r.getString(2), on), on));
                    }
                }
            }
        }
    }

    private void loadSetters(Connection c) throws SQLException {
        try (PreparedStatement s = c.prepareStatement("SELECT id, name FROM setter");
                ResultSet r = s.executeQuery()) {
            while (r.next()) {
                setters.put(r.getString(2), r.getLong(1));
            }
        }
    }

    private void writeRoutes(List<RowSource> sources, BulkInserts bulk) throws SQLException {
        Set<RouteKey> written = new HashSet<>();
        for (RowSource s : sources) {
            if (s.kind() != TableKind.ROUTES) {
                continue;
            }
            try (RowCursor c = s.rows()) {
                while (c.hasNext()) {
                    RouteRow row = quiet.route(c.next());
                    RouteKey k = row == null ? null : plan.intern(row.key());
                    ImportPlan.PlannedRoute p = k == null ? null : plan.routes.get(k);
                    if (p == null || !p.from(row) || !writesRoute(k) || !written.add(k)) {
                        continue;
                    }
                    if (plan.newRoutes.contains(k)) {
                        insert(k, row, bulk);
                    } else {
                        update(k, row, bulk);
                    }
                }
            }
        }
    }

    private void insert(RouteKey k, RouteRow row, BulkInserts bulk) throws SQLException {
        ResetRef reset = reset(k, row, bulk);
        Route r = new Route(reset.entity, k.label(), k.setOn(), row.discipline(), row.grade());
        fill(r, row);
        List<Long> ids = new ArrayList<>();
        for (String name : row.setters()) {
            ids.add(setterId(name, bulk));
        }
        WallRef wall = walls.get(List.of(k.gym(), k.wall()));
        routeIds.put(k, bulk.route(r, wall.gymId(), reset.wallId, reset.id, ids));
    }

    /** A changed route, updated through its entity (rare: the batches are sent first, the session flushed after). */
    private void update(RouteKey k, RouteRow row, BulkInserts bulk) throws SQLException {
        ResetRef reset = reset(k, row, bulk);
        List<Setter> list = new ArrayList<>();
        for (String name : row.setters()) {
            list.add(session.getReference(Setter.class, setterId(name, bulk)));
        }
        bulk.flush();
        Route r = find(k);
        r.setGrade(row.grade());
        r.setReset(session.getReference(Reset.class, reset.id));
        fill(r, row);
        r.setSetters(list);
        session.flush();
        routeIds.put(k, r.id());
    }

    private ResetRef reset(RouteKey k, RouteRow row, BulkInserts bulk) throws SQLException {
        List<String> key = List.of(k.gym(), row.reset());
        ResetRef ref = resets.get(key);
        if (ref == null) {
            WallRef wall = walls.get(List.of(k.gym(), k.wall()));
            Reset entity = new Reset(wall.entity(), row.reset(), k.setOn());
            ref = new ResetRef(bulk.reset(entity, wall.gymId(), wall.wallId()), wall.wallId(), entity, k.setOn());
            resets.put(key, ref);
        } else if (k.setOn().isBefore(ref.on)) {
            bulk.resetOnOrBefore(ref.id, k.setOn());
            ref.on = k.setOn();
        }
        return ref;
    }

    private long setterId(String name, BulkInserts bulk) throws SQLException {
        Setter transientSetter = new Setter(name);
        Long id = setters.get(transientSetter.name());
        if (id == null) {
            id = bulk.setter(transientSetter);
            setters.put(transientSetter.name(), id);
        }
        return id;
    }

    private static void fill(Route r, RouteRow row) {
        if (row.strippedOn() != null) {
            r.setStrippedOn(row.strippedOn()); // an empty cell keeps the archive's strip date (RouteDiff)
        }
        r.setColor(row.color());
        r.setAngleDeg(row.angleDeg());
        r.setMoves(row.moves());
        r.setStyles(row.styles());
        r.setMoveDifficulty(row.moveDifficulty());
        r.setNotes(row.notes());
        r.setExtraFields(row.extraFields());
    }

    private long writeHolds(
            Connection c, List<RowSource> sources, RouteResolver resolver, BulkInserts bulk, ImportProgress progress)
            throws SQLException {
        try (PreparedStatement delete = c.prepareStatement("DELETE FROM hold_placement WHERE route_id = ?")) {
            for (RouteKey k : plan.keysWithHolds()) {
                if (plan.writesHoldsOf(k) && !plan.newRoutes.contains(k)) {
                    delete.setLong(1, routeId(k));
                    delete.executeUpdate();
                }
            }
        }
        Map<RouteKey, Integer> ordinals = new HashMap<>();
        long written = 0;
        List<PlacedHold> chunk = new ArrayList<>(HOLD_CHUNK);
        // This thread reads and parses the rows; a second one sends the batches (every route id is known by now, so
        // the second thread needs nothing from this one but the chunks).
        try (OverlappedChunks<PlacedHold> inserts =
                new OverlappedChunks<>("variset-hold-writer", part -> insertHolds(part, bulk))) {
            for (RowSource s : sources) {
                if (s.kind() != TableKind.HOLDS) {
                    continue;
                }
                try (RowCursor cursor = s.rows()) {
                    while (cursor.hasNext()) {
                        HoldRow h = quiet.hold(cursor.next());
                        RouteKey k = h == null ? null : resolver.resolve(h, null);
                        if (k == null || !plan.writesHoldsOf(k)) {
                            continue;
                        }
                        int ordinal = ordinals.merge(k, 1, Integer::sum) - 1;
                        chunk.add(new PlacedHold(routeId(k), ordinal, h.spec()));
                        if (chunk.size() == HOLD_CHUNK) {
                            inserts.submit(chunk);
                            chunk = new ArrayList<>(HOLD_CHUNK);
                        }
                        if (++written % PROGRESS_EVERY == 0) {
                            progress.advanced("writing holds", written);
                        }
                    }
                }
            }
            inserts.submit(chunk);
            inserts.finish();
        }
        return written;
    }

    /** A hold placement ready to insert. */
    private record PlacedHold(long routeId, int ordinal, HoldPlacement.Spec spec) {}

    private static void insertHolds(List<PlacedHold> part, BulkInserts bulk) {
        try {
            for (PlacedHold p : part) {
                bulk.hold(p.routeId(), p.ordinal(), p.spec());
            }
        } catch (SQLException e) {
            throw writeFailure(e);
        }
    }

    private static ArchiveException writeFailure(SQLException e) {
        return new ArchiveException(
                ArchiveException.Problem.DAMAGED, "Cannot write to the archive: " + e.getMessage(), e);
    }

    private long routeId(RouteKey k) {
        return routeIds.computeIfAbsent(k, key -> find(key).id());
    }

    private Route find(RouteKey k) {
        return new ArchiveQueries(session)
                .route(k.gym(), k.wall(), k.label(), k.setOn())
                .orElse(null);
    }
}
