package org.variset.archive.store;

import java.sql.Connection;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.LocalDate;

/**
 * What an archive holds, as {@code variset info} shows it.
 *
 * @param gyms number of gyms
 * @param walls number of walls
 * @param resets number of resets
 * @param routes number of routes and boulder problems
 * @param holds number of hold placements
 * @param setters number of setters
 * @param firstSetOn the earliest set_on, or null when there are no routes
 * @param lastSetOn the latest set_on, or null
 * @param schemaVersion the schema version
 */
public record ArchiveStats(
        long gyms,
        long walls,
        long resets,
        long routes,
        long holds,
        long setters,
        LocalDate firstSetOn,
        LocalDate lastSetOn,
        int schemaVersion) {

    static ArchiveStats read(Connection c, int schemaVersion) throws SQLException {
        try (Statement s = c.createStatement();
                ResultSet rs = s.executeQuery("SELECT (SELECT COUNT(*) FROM gym), (SELECT COUNT(*) FROM wall),"
                        + " (SELECT COUNT(*) FROM reset), (SELECT COUNT(*) FROM route),"
                        + " (SELECT COUNT(*) FROM hold_placement), (SELECT COUNT(*) FROM setter),"
                        + " (SELECT MIN(set_on) FROM route), (SELECT MAX(set_on) FROM route)")) {
            rs.next();
            return new ArchiveStats(
                    rs.getLong(1),
                    rs.getLong(2),
                    rs.getLong(3),
                    rs.getLong(4),
                    rs.getLong(5),
                    rs.getLong(6),
                    rs.getObject(7, LocalDate.class),
                    rs.getObject(8, LocalDate.class),
                    schemaVersion);
        }
    }
}
