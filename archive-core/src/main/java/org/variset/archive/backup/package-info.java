/**
 * Backup and restore of an embedded archive: a zip with the database as one consistent snapshot and a manifest
 * (schema, counts, SHA-256), and a restore that checks and opens the copy before it replaces anything.
 */
package org.variset.archive.backup;
