/**
 * Checking an archive: the database (schema, every row readable, no orphans, the rules of the interchange spec) and
 * the search index derived from it (Lucene's own check, documents against routes, change stamp).
 */
package org.variset.archive.check;
