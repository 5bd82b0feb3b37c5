package org.variset.archive.store;

import java.sql.Connection;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;

/**
 * The archive's schema version as Flyway recorded it, read with one plain JDBC query so that an up-to-date
 * archive opens without booting Flyway.
 *
 * @param version the highest version applied successfully, 0 for an empty database
 * @param failed true when a migration is recorded as failed
 */
public record SchemaVersion(int version, boolean failed) {

    /** The newest schema version this code knows; a test checks it against the migration files. */
    public static final int LATEST = 3;

    /** Flyway's history table. */
    static final String HISTORY = "flyway_schema_history";

    /** Reads the version, or 0 when the database has no history table. */
    static SchemaVersion read(Connection c) throws SQLException {
        try (ResultSet tables = c.getMetaData().getTables(null, null, HISTORY, null)) {
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

    /** True when the archive needs a migration before use. */
    public boolean behind() {
        return failed || version < LATEST;
    }
}
