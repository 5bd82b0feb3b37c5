package org.variset.archive.store;

import java.sql.Connection;
import java.sql.DatabaseMetaData;
import java.sql.SQLException;

/**
 * The database an archive runs on, as its driver reports it: Hibernate is told this instead of asking at boot
 * (which costs a round trip), so it picks the dialect of the server's real version.
 *
 * @param shared true for PostgreSQL (a shared archive), false for H2
 * @param major the server's major version
 * @param minor its minor version
 */
record DatabaseEngine(boolean shared, int major, int minor) {

    /** The engine of a connection's database. */
    static DatabaseEngine of(Connection c) throws SQLException {
        DatabaseMetaData m = c.getMetaData();
        return new DatabaseEngine(
                m.getDatabaseProductName().toLowerCase(java.util.Locale.ROOT).contains("postgres"),
                m.getDatabaseMajorVersion(),
                m.getDatabaseMinorVersion());
    }

    /** The product name Hibernate knows it by. */
    String product() {
        return shared ? "PostgreSQL" : "H2";
    }
}
