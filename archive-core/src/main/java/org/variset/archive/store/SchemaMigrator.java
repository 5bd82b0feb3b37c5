package org.variset.archive.store;

import javax.sql.DataSource;
import org.flywaydb.core.Flyway;
import org.flywaydb.core.api.FlywayException;
import org.variset.archive.store.ArchiveException.Problem;

/** Runs the versioned migrations in {@code db/migration} (only when the archive is new or behind). */
final class SchemaMigrator {

    private SchemaMigrator() {}

    static void migrate(DataSource ds, Object where) {
        try {
            Flyway.configure(SchemaMigrator.class.getClassLoader())
                    .dataSource(ds)
                    .locations("classpath:db/migration")
                    .failOnMissingLocations(true)
                    .validateMigrationNaming(true)
                    .load()
                    .migrate();
        } catch (FlywayException e) {
            throw new ArchiveException(
                    Problem.DAMAGED,
                    "The archive at " + (where == null ? "(memory)" : where)
                            + " could not be brought to schema version " + SchemaVersion.LATEST + ": " + e.getMessage()
                            + ". Nothing was changed by the failed step; restore a backup or report the message.",
                    e);
        }
    }
}
