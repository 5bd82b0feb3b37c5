package org.variset.archive.store;

import javax.sql.DataSource;
import org.hibernate.SessionFactory;
import org.hibernate.cfg.JdbcSettings;
import org.hibernate.jpa.HibernatePersistenceConfiguration;

/**
 * Boots Hibernate on the archive's data source with the start-up recipe of STACK.md: no JDBC metadata access at
 * boot (the database product and version are given), no schema generation or validation (Flyway owns the
 * schema; a test validates the mapping), batched and ordered inserts.
 */
final class OrmBootstrap {

    private OrmBootstrap() {}

    static SessionFactory build(DataSource ds, DatabaseEngine engine) {
        return configuration(ds, "none", engine).createEntityManagerFactory();
    }

    /** The configuration, with the schema action to take ({@code none} normally, {@code validate} in tests). */
    static HibernatePersistenceConfiguration configuration(DataSource ds, String schemaAction, DatabaseEngine engine) {
        return new HibernatePersistenceConfiguration("variset")
                .managedClasses(ArchiveEntities.ALL)
                .property(JdbcSettings.JAKARTA_NON_JTA_DATASOURCE, ds)
                .property(JdbcSettings.ALLOW_METADATA_ON_BOOT, "false")
                .property(JdbcSettings.JAKARTA_HBM2DDL_DB_NAME, engine.product())
                .property(JdbcSettings.JAKARTA_HBM2DDL_DB_MAJOR_VERSION, String.valueOf(engine.major()))
                .property(JdbcSettings.JAKARTA_HBM2DDL_DB_MINOR_VERSION, String.valueOf(engine.minor()))
                .property("hibernate.hbm2ddl.auto", schemaAction)
                .property("jakarta.persistence.validation.mode", "none")
                .property("hibernate.jdbc.batch_size", "50")
                .property("hibernate.order_inserts", "true")
                .property("hibernate.order_updates", "true")
                .property("hibernate.default_batch_fetch_size", "64")
                .property("hibernate.id.sequence.increment_size_mismatch_strategy", "exception");
    }

    /** Boots Hibernate and validates the mapping against the schema the migrations built. */
    static SessionFactory buildValidating(DataSource ds, DatabaseEngine engine) {
        return configuration(ds, "validate", engine)
                .property(JdbcSettings.ALLOW_METADATA_ON_BOOT, "true")
                .createEntityManagerFactory();
    }
}
