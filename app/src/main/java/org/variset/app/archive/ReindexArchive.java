package org.variset.app.archive;

import org.variset.app.Workspace;
import org.variset.archive.search.IndexProgress;
import org.variset.archive.search.IndexSync;
import org.variset.archive.search.SearchIndex;

/** Builds the search index again from the database (it is derived data). */
public final class ReindexArchive {
    private ReindexArchive() {}

    /**
     * What the rebuild did.
     *
     * @param sync the routes indexed and the change stamp the index now carries
     * @param seconds how long it took
     */
    public record Result(IndexSync sync, double seconds) {}

    /** Rebuilds the index, reporting progress. */
    public static Result run(Workspace w, IndexProgress progress) {
        long start = System.nanoTime();
        try (SearchIndex index = SearchIndex.of(w.archive())) {
            IndexSync s = index.rebuild(w.archive().connection(), progress, "asked for");
            return new Result(s, (System.nanoTime() - start) / 1e9);
        }
    }
}
