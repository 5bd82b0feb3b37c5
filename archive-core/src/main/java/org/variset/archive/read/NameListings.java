package org.variset.archive.read;

import java.sql.Connection;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import org.variset.archive.gym.WallDiscipline;

/**
 * The names a gym's archive holds, with what a person picks them by: its walls, its resets, its setters. Plain
 * queries, one per listing.
 */
public final class NameListings {
    private final Connection connection;

    /** Reads on a connection the caller keeps open. */
    public NameListings(Connection connection) {
        this.connection = connection;
    }

    /**
     * A wall.
     *
     * @param name its name
     * @param discipline boulder, rope or both, or null
     * @param angleDeg its angle, or null
     * @param cycleDays how often the gym means to reset it, or null
     * @param resets how many resets it has had
     * @param lastReset the day of its latest reset, or null
     * @param routesUp routes up on it on the day asked about
     */
    public record WallLine(
            String name,
            WallDiscipline discipline,
            Double angleDeg,
            Integer cycleDays,
            long resets,
            LocalDate lastReset,
            long routesUp) {}

    /**
     * A reset.
     *
     * @param label its label
     * @param wall its wall
     * @param resetOn its day
     * @param routes routes set in it
     * @param stillUp of those, the ones up on the day asked about
     */
    public record ResetLine(String label, String wall, LocalDate resetOn, long routes, long stillUp) {}

    /**
     * A setter who set in the gym.
     *
     * @param name their name
     * @param routes routes they set there (alone or with others)
     * @param firstSetOn the day of the first
     * @param lastSetOn the day of the latest
     */
    public record SetterLine(String name, long routes, LocalDate firstSetOn, LocalDate lastSetOn) {}

    /** The gym's walls by name, with the routes up on a day. */
    public List<WallLine> walls(long gymId, LocalDate on) {
        return Sql.query(
                connection,
                "SELECT w.name, w.discipline, w.angle_deg, w.cycle_days,"
                        + " (SELECT COUNT(*) FROM reset x WHERE x.wall_id = w.id),"
                        + " (SELECT MAX(x.reset_on) FROM reset x WHERE x.wall_id = w.id),"
                        + " (SELECT COUNT(*) FROM route r WHERE r.wall_id = w.id AND r.set_on <= ?"
                        + " AND (r.stripped_on IS NULL OR r.stripped_on > ?))"
                        + " FROM wall w WHERE w.gym_id = ? ORDER BY w.name",
                List.of(on, on, gymId),
                rs -> new WallLine(
                        rs.getString(1),
                        rs.getString(2) == null ? null : WallDiscipline.valueOf(rs.getString(2)),
                        (Double) rs.getObject(3),
                        (Integer) rs.getObject(4),
                        rs.getLong(5),
                        rs.getObject(6, LocalDate.class),
                        rs.getLong(7)));
    }

    /** The gym's resets, newest first, of one wall or (wall null) all, with the routes still up on a day. */
    public List<ResetLine> resets(long gymId, Long wallId, LocalDate on) {
        List<Object> params = new ArrayList<>(List.of(on, gymId));
        if (wallId != null) {
            params.add(wallId);
        }
        return Sql.query(
                connection,
                "SELECT x.label, w.name, x.reset_on, COUNT(r.id),"
                        + " COALESCE(SUM(CASE WHEN r.id IS NOT NULL AND (r.stripped_on IS NULL OR r.stripped_on > ?)"
                        + " THEN 1 ELSE 0 END), 0)"
                        + " FROM reset x JOIN wall w ON w.id = x.wall_id LEFT JOIN route r ON r.reset_id = x.id"
                        + " WHERE x.gym_id = ?" + (wallId == null ? "" : " AND x.wall_id = ?")
                        + " GROUP BY x.id, x.label, w.name, x.reset_on ORDER BY x.reset_on DESC, w.name, x.label",
                params,
                rs -> new ResetLine(
                        rs.getString(1),
                        rs.getString(2),
                        rs.getObject(3, LocalDate.class),
                        rs.getLong(4),
                        rs.getLong(5)));
    }

    /** The setters who set in the gym, by name. */
    public List<SetterLine> setters(long gymId) {
        return Sql.query(
                connection,
                "SELECT s.name, COUNT(DISTINCT r.id), MIN(r.set_on), MAX(r.set_on) FROM setter s"
                        + " JOIN route_setter rs ON rs.setter_id = s.id JOIN route r ON r.id = rs.route_id"
                        + " WHERE r.gym_id = ? GROUP BY s.id, s.name ORDER BY s.name",
                List.of(gymId),
                rs -> new SetterLine(
                        rs.getString(1),
                        rs.getLong(2),
                        rs.getObject(3, LocalDate.class),
                        rs.getObject(4, LocalDate.class)));
    }
}
