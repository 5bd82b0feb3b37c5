package org.variset.archive.schema;

import java.sql.Connection;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import org.variset.archive.problem.ArchiveException;

/**
 * The archive's schema version as Flyway recorded it, read with one plain JDBC query so that an up-to-date
 * archive opens without booting Flyway.
 *
 * @param version the highest version applied successfully, 0 for an empty database
 * @param failed true when a migration is recorded as failed
 */
public record SchemaVersion(int version, boolean failed) {

    /** The newest schema version this code knows; a test checks it against the migration files. */
    public static final int LATEST = 6;

    /** Flyway's history table. */
    static final String HISTORY = "flyway_schema_history";

    /** Reads the version, or 0 when the database has no history table. */
    public static SchemaVersion read(Connection c) throws SQLException {
        // In this schema only: a PostgreSQL database may hold several archives, one per schema.
        try (ResultSet tables = c.getMetaData().getTables(null, c.getSchema(), HISTORY, null)) {
            if (!tables.next()) {
                return new SchemaVersion(0, false);
            }
        }
        int max = 0;
        boolean failed = false;
        try (Statement s = c.createStatement();
                ResultSet rs = s.executeQuery("SELECT \"version\", \"success\" FROM \"" + HISTORY + "\""
                        + " WHERE \"version\" IS NOT NULL")) {
            while (rs.next()) {
                if (rs.getBoolean(2)) {
                    max = Math.max(max, Integer.parseInt(rs.getString(1)));
                } else {
                    failed = true;
                }
            }
        }
        return new SchemaVersion(max, failed);
    }

    /**
     * What tells this archive from any other, for derived data kept elsewhere (a client's search index): a random id
     * written when the archive was first opened ({@code archive_info}, schema version 4); empty when there is none.
     */
    public static String identity(Connection c) {
        try (Statement s = c.createStatement();
                ResultSet rs = s.executeQuery("SELECT info_value FROM archive_info WHERE info_key = 'identity'")) {
            return rs.next() ? rs.getString(1) : "";
        } catch (SQLException e) {
            throw new ArchiveException(
                    ArchiveException.Problem.DAMAGED, "Cannot read the archive's identity: " + e.getMessage(), e);
        }
    }

    /** Writes the archive's identity when it has none (a new archive, or one made before schema version 4). */
    public static void ensureIdentity(Connection c) throws SQLException {
        if (!identity(c).isEmpty()) {
            return;
        }
        try (java.sql.PreparedStatement s = c.prepareStatement("INSERT INTO archive_info (info_key, info_value) "
                + "SELECT 'identity', ? FROM archive_info WHERE info_key = 'identity' HAVING COUNT(*) = 0")) {
            s.setString(1, java.util.UUID.randomUUID().toString());
            s.executeUpdate();
        } catch (SQLException e) {
            if (identity(c).isEmpty()) {
                throw e; // not another client that wrote it first
            }
        }
    }

    /** True when the archive needs a migration before use. */
    public boolean behind() {
        return failed || version < LATEST;
    }
}
