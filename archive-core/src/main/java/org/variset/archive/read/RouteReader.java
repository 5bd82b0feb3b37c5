package org.variset.archive.read;

import java.sql.Connection;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Consumer;
import org.variset.archive.grade.Discipline;
import org.variset.archive.grade.GradeScale;
import org.variset.archive.mapping.DoubleListConverter;
import org.variset.archive.mapping.ExtraFieldsConverter;
import org.variset.archive.mapping.IntegerListConverter;
import org.variset.archive.mapping.StringListConverter;
import org.variset.archive.route.HoldRole;
import org.variset.archive.route.HoldSize;

/**
 * Reads routes with their holds and setters: three queries per read (routes, holds, setters), each under the same
 * condition, whatever the number of routes. Large reads go in chunks of route ids ({@link #forEachChunk}), so
 * memory stays bounded by the chunk.
 */
public final class RouteReader {
    private static final String ROUTE_COLUMNS = "r.id, g.name, w.name, w.angle_deg, rs.label, rs.reset_on, r.label,"
            + " r.set_on, r.stripped_on, r.discipline, r.grade_text, r.grade_scale, r.grade_ircra, r.color,"
            + " r.angle_deg, r.moves, r.styles, r.move_difficulty, r.notes, r.extra_fields";
    private static final String ROUTE_TABLES = " FROM route r JOIN gym g ON g.id = r.gym_id JOIN wall w"
            + " ON w.id = r.wall_id JOIN reset rs ON rs.id = r.reset_id";

    private final Connection connection;
    private final StringListConverter strings = new StringListConverter();
    private final IntegerListConverter integers = new IntegerListConverter();
    private final DoubleListConverter doubles = new DoubleListConverter();
    private final ExtraFieldsConverter extraFields = new ExtraFieldsConverter();

    /** Reads on a connection the caller keeps open. */
    public RouteReader(Connection connection) {
        this.connection = connection;
    }

    /** The routes the filter selects, by set_on, wall and label. */
    public List<RouteRecord> read(RouteFilter filter) {
        return read(filter, null, null, " ORDER BY r.set_on, w.name, r.label");
    }

    /**
     * Reads every route the filter selects in chunks of ascending id, handing each chunk to the consumer.
     *
     * @return the number of routes read
     */
    public long forEachChunk(RouteFilter filter, int chunkSize, Consumer<List<RouteRecord>> consumer) {
        long after = Long.MIN_VALUE;
        long total = 0;
        while (true) {
            Long last = lastIdOfChunk(filter, after, chunkSize);
            if (last == null) {
                return total;
            }
            List<RouteRecord> chunk = read(filter, after, last, " ORDER BY r.id");
            total += chunk.size();
            consumer.accept(chunk);
            after = last;
        }
    }

    private Long lastIdOfChunk(RouteFilter filter, long after, int size) {
        List<Object> p = new ArrayList<>();
        String where = filter.where(p);
        p.add(after);
        String sql = "SELECT MAX(id) FROM (SELECT r.id FROM route r WHERE " + where + " AND r.id > ? ORDER BY r.id"
                + " FETCH FIRST " + size + " ROWS ONLY) chunk";
        return query(sql, p, rs -> {
                    long v = rs.getLong(1);
                    return rs.wasNull() ? null : v;
                })
                .get(0);
    }

    private List<RouteRecord> read(RouteFilter filter, Long afterId, Long toId, String order) {
        List<Object> p = new ArrayList<>();
        String where = filter.where(p);
        if (afterId != null) {
            where += " AND r.id > ? AND r.id <= ?";
            p.add(afterId);
            p.add(toId);
        }
        Map<Long, List<HoldRecord>> holds = holds(where, p);
        Map<Long, List<String>> setters = setters(where, p);
        return query("SELECT " + ROUTE_COLUMNS + ROUTE_TABLES + " WHERE " + where + order, p, rs -> {
            long id = rs.getLong(1);
            Double routeAngle = (Double) rs.getObject(15);
            Double angle = routeAngle != null ? routeAngle : (Double) rs.getObject(4);
            return new RouteRecord(
                    id,
                    rs.getString(2),
                    rs.getString(3),
                    rs.getString(5),
                    rs.getObject(6, LocalDate.class),
                    rs.getString(7),
                    rs.getObject(8, LocalDate.class),
                    rs.getObject(9, LocalDate.class),
                    Discipline.valueOf(rs.getString(10)),
                    rs.getString(11),
                    GradeScale.valueOf(rs.getString(12)),
                    rs.getDouble(13),
                    rs.getString(14),
                    angle,
                    routeAngle,
                    setters.getOrDefault(id, List.of()),
                    strings.convertToEntityAttribute(rs.getString(16)),
                    strings.convertToEntityAttribute(rs.getString(17)),
                    integers.convertToEntityAttribute(rs.getString(18)),
                    rs.getString(19),
                    holds.getOrDefault(id, List.of()),
                    extras(rs.getString(20)));
        });
    }

    private Map<Long, List<HoldRecord>> holds(String where, List<Object> p) {
        Map<Long, List<HoldRecord>> out = new HashMap<>();
        Sql.forEach(
                connection,
                "SELECT h.route_id, h.seq, h.role, h.hold_type, h.hold_size, h.grip_deg, h.hold_ref,"
                        + " h.x_m, h.y_m, h.extra_fields FROM hold_placement h JOIN route r ON r.id = h.route_id"
                        + " WHERE " + where
                        + " ORDER BY h.route_id, h.ordinal",
                p,
                rs -> {
                    String size = rs.getString(5);
                    HoldRecord h = new HoldRecord(
                            (Integer) rs.getObject(2),
                            HoldRole.valueOf(rs.getString(3)),
                            rs.getString(4),
                            size == null ? null : HoldSize.valueOf(size),
                            doubles.convertToEntityAttribute(rs.getString(6)),
                            rs.getString(7),
                            (Double) rs.getObject(8),
                            (Double) rs.getObject(9),
                            extras(rs.getString(10)));
                    out.computeIfAbsent(rs.getLong(1), k -> new ArrayList<>()).add(h);
                });
        return out;
    }

    private Map<Long, List<String>> setters(String where, List<Object> p) {
        Map<Long, List<String>> out = new LinkedHashMap<>();
        Sql.forEach(
                connection,
                "SELECT rs.route_id, s.name FROM route_setter rs JOIN setter s ON s.id = rs.setter_id"
                        + " JOIN route r ON r.id = rs.route_id WHERE " + where + " ORDER BY rs.route_id, rs.ord",
                p,
                rs -> {
                    out.computeIfAbsent(rs.getLong(1), k -> new ArrayList<>()).add(rs.getString(2));
                });
        return out;
    }

    /** Extra columns from their JSON text; most rows have none, so the common case costs no parsing. */
    private Map<String, String> extras(String json) {
        return json == null || json.equals("{}") ? Map.of() : extraFields.convertToEntityAttribute(json);
    }

    private <T> List<T> query(String sql, List<Object> params, Sql.RowMapper<T> mapper) {
        return Sql.query(connection, sql, params, mapper);
    }
}
