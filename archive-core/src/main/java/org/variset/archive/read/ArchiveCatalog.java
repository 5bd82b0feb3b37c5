package org.variset.archive.read;

import java.sql.Connection;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.time.LocalDate;
import java.time.ZoneId;
import java.util.List;
import java.util.Optional;
import org.variset.archive.gym.Unknown;
import org.variset.archive.gym.WallDiscipline;

/**
 * Gyms, walls, resets and setters by name, with messages that list what there is when a name is not found. The gym
 * may be left out when the archive holds only one.
 */
public final class ArchiveCatalog {
    private static final String WALL =
            "SELECT id, gym_id, name, discipline, angle_deg, height_m, width_m, cycle_days" + " FROM wall";
    private static final String RESET = "SELECT rs.id, rs.wall_id, w.name, rs.label, rs.reset_on FROM reset rs"
            + " JOIN wall w ON w.id = rs.wall_id";

    private final Connection connection;

    /** Reads on a connection the caller keeps open. */
    public ArchiveCatalog(Connection connection) {
        this.connection = connection;
    }

    /** Every gym, by name. */
    public List<GymRecord> gyms() {
        return Sql.query(
                connection, "SELECT id, name, time_zone FROM gym ORDER BY name", List.of(), ArchiveCatalog::gym);
    }

    /**
     * The named gym, or the only one when the name is null.
     *
     * @throws IllegalArgumentException naming the gyms there are
     */
    public GymRecord gym(String name) {
        List<GymRecord> gyms = gyms();
        if (name == null) {
            if (gyms.size() == 1) {
                return gyms.get(0);
            }
            throw Unknown.unnamedGym(gyms.stream().map(GymRecord::name).toList());
        }
        return gyms.stream()
                .filter(g -> g.name().equals(name.strip()))
                .findFirst()
                .orElseThrow(() ->
                        Unknown.gym(name, gyms.stream().map(GymRecord::name).toList()));
    }

    /** The walls of a gym, by name. */
    public List<WallRecord> walls(long gymId) {
        return Sql.query(connection, WALL + " WHERE gym_id = ? ORDER BY name", List.of(gymId), ArchiveCatalog::wall);
    }

    /**
     * The named wall of a gym.
     *
     * @throws IllegalArgumentException naming the gym's walls
     */
    public WallRecord wall(GymRecord gym, String name) {
        List<WallRecord> walls = walls(gym.id());
        return walls.stream()
                .filter(w -> w.name().equals(name.strip()))
                .findFirst()
                .orElseThrow(() -> Unknown.wall(
                        gym.name(), name, walls.stream().map(WallRecord::name).toList()));
    }

    /** The resets of a wall, oldest first (index reset_wall_date). */
    public List<ResetRecord> resetsOfWall(long wallId) {
        return Sql.query(
                connection,
                RESET + " WHERE rs.wall_id = ? ORDER BY rs.reset_on, rs.label",
                List.of(wallId),
                ArchiveCatalog::reset);
    }

    /** The resets of a gym with a date in [from, to], by date then wall. */
    public List<ResetRecord> resetsOfGym(long gymId, LocalDate from, LocalDate to) {
        return Sql.query(
                connection,
                RESET + " WHERE rs.gym_id = ? AND rs.reset_on BETWEEN ? AND ?"
                        + " ORDER BY rs.reset_on, w.name, rs.label",
                List.of(gymId, from, to),
                ArchiveCatalog::reset);
    }

    /**
     * The reset with that label in a gym.
     *
     * @throws IllegalArgumentException naming the wall's latest resets when there is none
     */
    public ResetRecord reset(GymRecord gym, String label) {
        List<ResetRecord> found = Sql.query(
                connection,
                RESET + " WHERE rs.gym_id = ? AND rs.label = ?",
                List.of(gym.id(), label.strip()),
                ArchiveCatalog::reset);
        if (found.isEmpty()) {
            List<String> recent = Sql.query(
                    connection,
                    "SELECT label FROM reset WHERE gym_id = ?"
                            + " ORDER BY reset_on DESC, label FETCH FIRST 5 ROWS ONLY",
                    List.of(gym.id()),
                    rs -> rs.getString(1));
            throw Unknown.reset(gym.name(), label, recent);
        }
        return found.get(0);
    }

    /** The latest reset of a wall on or before a date (index reset_wall_date). */
    public Optional<ResetRecord> latestResetOnOrBefore(long wallId, LocalDate date) {
        return Sql.query(
                        connection,
                        RESET + " WHERE rs.wall_id = ? AND rs.reset_on <= ?"
                                + " ORDER BY rs.reset_on DESC, rs.label DESC FETCH FIRST 1 ROWS ONLY",
                        List.of(wallId, date),
                        ArchiveCatalog::reset)
                .stream()
                .findFirst();
    }

    /** Up to {@code count} resets of a wall before the given one, newest first. */
    public List<ResetRecord> resetsBefore(ResetRecord reset, int count) {
        return Sql.query(
                connection,
                RESET + " WHERE rs.wall_id = ? AND (rs.reset_on < ? OR rs.reset_on = ?"
                        + " AND rs.label < ?) ORDER BY rs.reset_on DESC, rs.label DESC FETCH FIRST " + count
                        + " ROWS ONLY",
                List.of(reset.wallId(), reset.resetOn(), reset.resetOn(), reset.label()),
                ArchiveCatalog::reset);
    }

    /**
     * The id of the setter with that name.
     *
     * @throws IllegalArgumentException when there is none, with the closest names
     */
    public long setterId(String name) {
        List<Long> ids = Sql.query(
                connection, "SELECT id FROM setter WHERE name = ?", List.of(name.strip()), rs -> rs.getLong(1));
        if (ids.isEmpty()) {
            throw Unknown.setter(name, setterNames());
        }
        return ids.get(0);
    }

    /** The ids of a gym's routes with a label, oldest first. */
    public List<Long> routesLabelled(long gymId, String label) {
        return Sql.query(
                connection,
                "SELECT id FROM route WHERE gym_id = ? AND label = ? ORDER BY set_on, id",
                List.of(gymId, label.strip()),
                rs -> rs.getLong(1));
    }

    /** How many routes the archive holds. */
    public long routeCount() {
        return Sql.query(connection, "SELECT COUNT(*) FROM route", List.of(), rs -> rs.getLong(1))
                .get(0);
    }

    /** Every setter's name, sorted. */
    public List<String> setterNames() {
        return Sql.query(connection, "SELECT name FROM setter ORDER BY name", List.of(), rs -> rs.getString(1));
    }

    private static GymRecord gym(ResultSet rs) throws SQLException {
        return new GymRecord(rs.getLong(1), rs.getString(2), ZoneId.of(rs.getString(3)));
    }

    private static WallRecord wall(ResultSet rs) throws SQLException {
        String d = rs.getString(4);
        return new WallRecord(
                rs.getLong(1),
                rs.getLong(2),
                rs.getString(3),
                d == null ? null : WallDiscipline.valueOf(d),
                (Double) rs.getObject(5),
                (Double) rs.getObject(6),
                (Double) rs.getObject(7),
                (Integer) rs.getObject(8));
    }

    private static ResetRecord reset(ResultSet rs) throws SQLException {
        return new ResetRecord(
                rs.getLong(1), rs.getLong(2), rs.getString(3), rs.getString(4), rs.getObject(5, LocalDate.class));
    }
}
