/**
 * The archive's schema: which version a database has ({@link org.variset.archive.schema.SchemaVersion}, one query on
 * Flyway's history table) and migrating it to the latest ({@link org.variset.archive.schema.SchemaMigrator}, the
 * versioned migrations in {@code db/migration}, the same SQL for H2 and PostgreSQL).
 */
package org.variset.archive.schema;
