package org.variset.archive.schema;

import javax.sql.DataSource;
import org.flywaydb.core.Flyway;
import org.flywaydb.core.api.FlywayException;
import org.variset.archive.problem.ArchiveException;
import org.variset.archive.problem.ArchiveException.Problem;

/** Runs the versioned migrations in {@code db/migration} (only when the archive is new or behind). */
public final class SchemaMigrator {

    private SchemaMigrator() {}

    /**
     * Brings the database to {@link SchemaVersion#LATEST}.
     *
     * @param where the archive, for the message when a step fails
     * @throws ArchiveException when a migration fails (the failed step changes nothing)
     */
    public static void migrate(DataSource ds, Object where) {
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
