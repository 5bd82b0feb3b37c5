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
    private IndexUpkeep() {}

    /**
     * A test hook: with this environment variable set to a number of milliseconds, a command that wrote the database
     * says so on standard error and pauses that long before it updates the index, so that crash tests can kill it
     * between the two commits and two-process tests can find the archive busy. Unset in normal use.
     */
    public static final String PAUSE_HOOK = "VARISET_TEST_PAUSE_BEFORE_INDEX_MS";

    /** Brings the index up to date after a write; a failure is a warning on {@code err}, never an error. */
    public static void afterWrite(Archive archive, PrintWriter err) {
        afterWrite(archive, err, IndexProgress.NONE);
    }

    /** As {@link #afterWrite(Archive, PrintWriter)}, reporting progress (a large import changes many routes). */
    public static void afterWrite(Archive archive, PrintWriter err, IndexProgress progress) {
        if (archive.indexDir() == null) {
            return;
        }
        pauseForTests(err);
        try (SearchIndex index = SearchIndex.of(archive)) {
            index.sync(archive.connection(), progress);
        } catch (RuntimeException e) {
            err.println("variset: warning: the search index could not be updated (" + e.getMessage() + "); the "
                    + "archive itself is complete, and the next search will bring the index up to date.");
        }
    }

    private static void pauseForTests(PrintWriter err) {
        String ms = System.getenv(PAUSE_HOOK);
        if (ms == null || ms.isBlank()) {
            return;
        }
        err.println("variset: database committed; pausing " + ms + " ms before the index (" + PAUSE_HOOK + ")");
        err.flush();
        try {
            Thread.sleep(Long.parseLong(ms.strip()));
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        } catch (NumberFormatException e) {
            err.println("variset: " + PAUSE_HOOK + " is not a number of milliseconds; not pausing");
        }
    }

    /** Brings the index up to date before it answers, saying so on {@code err} when it had to. */
    public static SearchIndex current(Archive archive, PrintWriter err, IndexProgress progress) {
        SearchIndex index = SearchIndex.of(archive);
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
