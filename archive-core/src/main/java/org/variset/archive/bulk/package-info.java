/**
 * Bulk writing: new routes, setters, resets and hold placements inserted with plain JDBC batches, column for column
 * as the entities map them, with ids drawn from the same sequences in the same way as Hibernate's pooled
 * optimizer, so the two can be mixed in one archive and one transaction; and {@code OverlappedChunks}, which lets a
 * second core write or index one chunk while the caller reads the next.
 */
package org.variset.archive.bulk;
