package org.variset.archive.bulk;

import java.sql.Connection;
import java.sql.Date;
import java.sql.PreparedStatement;
import java.sql.SQLException;
import java.sql.Types;
import java.time.LocalDate;
import java.util.List;
import org.variset.archive.mapping.DoubleListConverter;
import org.variset.archive.mapping.ExtraFieldsConverter;
import org.variset.archive.mapping.IntegerListConverter;
import org.variset.archive.mapping.StringListConverter;
import org.variset.archive.route.HoldPlacement;
import org.variset.archive.route.Reset;
import org.variset.archive.route.Route;
import org.variset.archive.route.Setter;

/**
 * Inserts new resets, setters, routes (with their setters) and hold placements with JDBC batches in the caller's
 * transaction. Values are taken from transient entities, so they are cleaned exactly as the entities clean them
 * (labels stripped, blanks to null, lists as JSON); ids come from {@link IdBlocks}. Batches are sent in the order the
 * foreign keys need (setters, resets, routes, route setters, holds) whenever one fills, and by {@link #flush()}.
 */
public final class BulkInserts implements AutoCloseable {
    /** Rows per batch: large enough to amortise the round trip, small enough to keep memory flat. */
    static final int BATCH = 1_000;

    private final IdBlocks ids;
    private final PreparedStatement setter;
    private final PreparedStatement reset;
    private final PreparedStatement resetDate;
    private final PreparedStatement route;
    private final PreparedStatement routeSetter;
    private final PreparedStatement hold;
    private final StringListConverter strings = new StringListConverter();
    private final IntegerListConverter integers = new IntegerListConverter();
    private final DoubleListConverter doubles = new DoubleListConverter();
    private final ExtraFieldsConverter extras = new ExtraFieldsConverter();
    private final int[] pending = new int[6];
    private long routes;
    private long holds;

    /** Batches on a connection, in its transaction. */
    public BulkInserts(Connection c) throws SQLException {
        this.ids = new IdBlocks(c);
        this.setter = c.prepareStatement("INSERT INTO setter (id, name) VALUES (?, ?)");
        this.reset = c.prepareStatement(
                "INSERT INTO reset (id, gym_id, wall_id, label, reset_on) VALUES (?, ?, ?, ?," + " ?)");
        this.resetDate = c.prepareStatement("UPDATE reset SET reset_on = ? WHERE id = ? AND reset_on > ?");
        this.route = c.prepareStatement("INSERT INTO route (id, gym_id, wall_id, reset_id, label, set_on, stripped_on,"
                + " discipline, grade_text, grade_scale, grade_ircra, color, angle_deg, moves, styles, "
                + "move_difficulty, notes, extra_fields) "
                + "VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)");
        this.routeSetter = c.prepareStatement("INSERT INTO route_setter (route_id, setter_id, ord) VALUES (?, ?, ?)");
        this.hold = c.prepareStatement("INSERT INTO hold_placement (id, route_id, ordinal, seq, role, hold_type, "
                + "hold_size, grip_deg, hold_ref, x_m, y_m, extra_fields) VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)");
    }

    /** Adds a setter; returns its id. */
    public long setter(Setter s) throws SQLException {
        long id = ids.next("setter_seq");
        setter.setLong(1, id);
        setter.setString(2, s.name());
        add(setter, 0);
        return id;
    }

    /** Adds a reset of a wall; returns its id. */
    public long reset(Reset r, long gymId, long wallId) throws SQLException {
        long id = ids.next("reset_seq");
        reset.setLong(1, id);
        reset.setLong(2, gymId);
        reset.setLong(3, wallId);
        reset.setString(4, r.label());
        reset.setDate(5, Date.valueOf(r.resetOn()));
        add(reset, 1);
        return id;
    }

    /** Moves a stored reset's date earlier (never later), as {@link Reset#includeSetOn} does for an entity. */
    public void resetOnOrBefore(long resetId, LocalDate day) throws SQLException {
        flush();
        resetDate.setDate(1, Date.valueOf(day));
        resetDate.setLong(2, resetId);
        resetDate.setDate(3, Date.valueOf(day));
        resetDate.executeUpdate();
    }

    /**
     * Adds a route with its setters (in order); returns its id. The route's gym, wall and reset are taken as the
     * given ids, since a transient route's entities have none.
     */
    public long route(Route r, long gymId, long wallId, long resetId, List<Long> setterIds) throws SQLException {
        long id = ids.next("route_seq");
        route.setLong(1, id);
        route.setLong(2, gymId);
        route.setLong(3, wallId);
        route.setLong(4, resetId);
        route.setString(5, r.label());
        route.setDate(6, Date.valueOf(r.setOn()));
        route.setDate(7, r.strippedOn() == null ? null : Date.valueOf(r.strippedOn()));
        route.setString(8, r.discipline().name());
        route.setString(9, r.gradeText());
        route.setString(10, r.gradeScale().name());
        route.setDouble(11, r.gradeIrcra());
        route.setString(12, r.color());
        setDouble(route, 13, r.angleDeg());
        route.setString(14, strings.convertToDatabaseColumn(r.moves()));
        route.setString(15, strings.convertToDatabaseColumn(r.styles()));
        route.setString(16, integers.convertToDatabaseColumn(r.moveDifficulty()));
        route.setString(17, r.notes());
        route.setString(18, extras.convertToDatabaseColumn(r.extraFields()));
        add(route, 2);
        for (int i = 0; i < setterIds.size(); i++) {
            routeSetter.setLong(1, id);
            routeSetter.setLong(2, setterIds.get(i));
            routeSetter.setInt(3, i);
            add(routeSetter, 3);
        }
        routes++;
        return id;
    }

    /** Adds a hold placement of a route, at a position among the route's holds (from 0). */
    public void hold(long routeId, int ordinal, HoldPlacement.Spec spec) throws SQLException {
        HoldPlacement h = HoldPlacement.placedOn(null, ordinal, spec);
        hold.setLong(1, ids.next("hold_seq"));
        hold.setLong(2, routeId);
        hold.setInt(3, h.ordinal());
        if (h.seq() == null) {
            hold.setNull(4, Types.INTEGER);
        } else {
            hold.setInt(4, h.seq());
        }
        hold.setString(5, h.role().name());
        hold.setString(6, h.type());
        hold.setString(7, h.size() == null ? null : h.size().name());
        hold.setString(8, doubles.convertToDatabaseColumn(h.grips()));
        hold.setString(9, h.holdRef());
        setDouble(hold, 10, h.xM());
        setDouble(hold, 11, h.yM());
        hold.setString(12, extras.convertToDatabaseColumn(spec.extraFields()));
        add(hold, 4);
        holds++;
    }

    /** Routes added so far. */
    public long routes() {
        return routes;
    }

    /** Hold placements added so far. */
    public long holds() {
        return holds;
    }

    private void add(PreparedStatement s, int slot) throws SQLException {
        s.addBatch();
        if (++pending[slot] >= BATCH) {
            flush();
        }
    }

    /** Sends every pending batch, parents before children. */
    public void flush() throws SQLException {
        PreparedStatement[] order = {setter, reset, route, routeSetter, hold};
        for (int i = 0; i < order.length; i++) {
            if (pending[i] > 0) {
                order[i].executeBatch();
                pending[i] = 0;
            }
        }
    }

    private static void setDouble(PreparedStatement s, int i, Double v) throws SQLException {
        if (v == null) {
            s.setNull(i, Types.DOUBLE);
        } else {
            s.setDouble(i, v);
        }
    }

    /** Sends what is pending and closes the statements (the connection stays open). */
    @Override
    public void close() throws SQLException {
        try {
            flush();
        } finally {
            for (PreparedStatement s : new PreparedStatement[] {setter, reset, resetDate, route, routeSetter, hold}) {
                s.close();
            }
            ids.close();
        }
    }
}
