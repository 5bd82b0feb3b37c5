package org.variset.cli.internal;

import java.io.PrintWriter;
import org.variset.archive.search.IndexProgress;
import org.variset.archive.search.IndexSync;
import org.variset.archive.search.SearchIndex;
import org.variset.archive.store.Archive;

/**
 * Keeps an archive's search index in step with its database after a command wrote to it. The database is the
 * truth: when the index cannot be written, the command still succeeded, and the next search brings the index up to
 * date; the user is told so.
 */
public final class IndexUpkeep {
    private IndexUpkeep() {
    }

    /** Brings the index up to date after a write; a failure is a warning on {@code err}, never an error. */
    public static void afterWrite(Archive archive, PrintWriter err) {
        if (archive.dir() == null) {
            return;
        }
        try (SearchIndex index = SearchIndex.at(archive.dir())) {
            index.sync(archive.connection(), IndexProgress.NONE);
        } catch (RuntimeException e) {
            err.println("variset: warning: the search index could not be updated (" + e.getMessage() + "); the "
                    + "archive itself is complete, and the next search will bring the index up to date.");
        }
    }

    /** Brings the index up to date before it answers, saying so on {@code err} when it had to. */
    public static SearchIndex current(Archive archive, PrintWriter err, IndexProgress progress) {
        SearchIndex index = SearchIndex.at(archive.dir());
        try {
            IndexSync s = index.sync(archive.connection(), progress);
            if (!s.notice().isEmpty()) {
                err.println("variset: " + s.notice());
            }
            return index;
        } catch (RuntimeException e) {
            index.close();
            throw e;
        }
    }
}
