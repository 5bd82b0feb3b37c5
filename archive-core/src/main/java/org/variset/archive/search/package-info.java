/**
 * The search index: a Lucene index of every route beside the database, derived from it and kept current through the
 * change log, and the query language people type to search it. The database is the truth: the index carries the
 * database's change stamp, and a stale or missing index is caught up or rebuilt before it answers.
 */
package org.variset.archive.search;
