/**
 * The archive store: where it lives, how it is created and opened, how its schema is migrated, and the queries the
 * rest of Variset asks of it.
 *
 * <p>An embedded archive is a folder holding an H2 database ({@code archive.mv.db}); a shared archive is a PostgreSQL
 * database (or schema) that many clients use at once ({@link org.variset.archive.server.ServerAddress}). Both have the
 * same schema, created and evolved only by the versioned Flyway migrations in {@code db/migration}; Hibernate never
 * changes it. Opening an archive holds one JDBC connection for the whole command, checks the schema version with one
 * query, runs Flyway only when the archive is behind, and boots Hibernate only when a command asks for it.
 */
package org.variset.archive.store;
