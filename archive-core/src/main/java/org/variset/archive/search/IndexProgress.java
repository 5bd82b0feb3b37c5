package org.variset.archive.search;

/** Progress of indexing, for long rebuilds. */
@FunctionalInterface
public interface IndexProgress {
    /** Reports nothing. */
    IndexProgress NONE = (done, total) -> {};

    /**
     * Called after each batch.
     *
     * @param done routes indexed so far
     * @param total routes to index
     */
    void indexed(long done, long total);
}
