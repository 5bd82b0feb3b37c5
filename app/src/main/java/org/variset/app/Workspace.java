package org.variset.app;

import java.time.Clock;
import java.time.LocalDate;
import java.time.ZoneOffset;
import java.util.List;
import java.util.Objects;
import java.util.function.Function;
import org.variset.archive.gym.GymCalendar;
import org.variset.archive.location.ArchiveLocation;
import org.variset.archive.read.ArchiveCatalog;
import org.variset.archive.read.GymRecord;
import org.variset.archive.search.IndexProgress;
import org.variset.archive.search.IndexSync;
import org.variset.archive.search.SearchIndex;
import org.variset.archive.store.Archive;
import org.variset.archive.store.ArchiveLock;
import org.variset.archive.store.Transaction;

/**
 * An open archive as the use cases work on it: with the clock that decides "today", where notices go, and the
 * upkeep of the search index after every write. A command-line run opens one per command; the web workspace keeps one
 * for as long as it serves.
 */
public final class Workspace implements AutoCloseable {
    /**
     * A test hook: with this environment variable set to a number of milliseconds, a use case that wrote the
     * database says so (a notice) and pauses that long before it updates the index, so that crash tests can kill it
     * between the two commits and two-process tests can find the archive busy. Unset in normal use.
     */
    public static final String PAUSE_HOOK = "VARISET_TEST_PAUSE_BEFORE_INDEX_MS";

    private final Archive archive;
    private final Clock clock;
    private final Notices notices;

    private Workspace(Archive archive, Clock clock, Notices notices) {
        this.archive = Objects.requireNonNull(archive, "archive");
        this.clock = Objects.requireNonNull(clock, "clock");
        this.notices = Objects.requireNonNull(notices, "notices");
    }

    /**
     * Opens the archive a location names, migrating it if it is behind.
     *
     * @throws org.variset.archive.problem.ArchiveException when there is none, it stays in use, or it is newer than
     *     this Variset
     */
    public static Workspace open(ArchiveLocation where, Clock clock, Notices notices) {
        return new Workspace(Archive.open(where, ArchiveLock.DEFAULT_WAIT), clock, notices);
    }

    /** A workspace over an archive already open; closing the workspace closes the archive. */
    public static Workspace over(Archive archive, Clock clock, Notices notices) {
        return new Workspace(archive, clock, notices);
    }

    /** The open archive, for the use cases of this layer. */
    public Archive archive() {
        return archive;
    }

    /** The archive in words: its folder, or the server and schema of a shared one. */
    public String describe() {
        return archive.describe();
    }

    /**
     * Says what this process is doing with the archive, for another process that finds an embedded archive in use
     * ("variset serve at http://127.0.0.1:7070/").
     */
    public void describeUse(String doing) {
        archive.describeUse(doing);
    }

    /** The clock that decides "today". */
    public Clock clock() {
        return clock;
    }

    /** Where notices go. */
    public Notices notices() {
        return notices;
    }

    /**
     * Today in a gym's time zone: the named gym's, else the only gym's; with several gyms and none named, the first
     * by name's (gyms of a chain may lie in several zones); in UTC while the archive holds no gym.
     *
     * @throws IllegalArgumentException when a named gym is unknown
     */
    public LocalDate today(String gym) {
        ArchiveCatalog catalog = new ArchiveCatalog(archive.connection());
        GymCalendar calendar = new GymCalendar(clock);
        if (gym != null) {
            return calendar.today(catalog.gym(gym).zone());
        }
        List<GymRecord> gyms = catalog.gyms();
        return calendar.today(gyms.isEmpty() ? ZoneOffset.UTC : gyms.get(0).zone());
    }

    /**
     * Runs writes in one transaction, then brings the search index up to date. When the index cannot be written the
     * work still stands (the database is the truth): a warning says so, and the next search catches up.
     */
    public <T> T write(Function<Transaction, T> work) {
        T result = archive.write(work);
        indexAfterWrite(IndexProgress.NONE);
        return result;
    }

    /** Brings the index up to date after a write made outside {@link #write} (an import); warns, never fails. */
    public void indexAfterWrite(IndexProgress progress) {
        if (archive.indexDir() == null) {
            return;
        }
        pauseForTests();
        try (SearchIndex index = SearchIndex.of(archive)) {
            index.sync(archive.connection(), progress);
        } catch (RuntimeException e) {
            notices.note(new Notice(
                    Notice.Kind.WARNING,
                    "the search index could not be updated (" + e.getMessage() + "); the archive itself is "
                            + "complete, and the next search will bring the index up to date."));
        }
    }

    /** The search index, brought up to date first (a notice says so when it had to); the caller closes it. */
    public SearchIndex currentIndex(IndexProgress progress) {
        SearchIndex index = SearchIndex.of(archive);
        try {
            IndexSync s = index.sync(archive.connection(), progress);
            if (!s.notice().isEmpty()) {
                notices.note(new Notice(Notice.Kind.INFO, s.notice()));
            }
            return index;
        } catch (RuntimeException e) {
            index.close();
            throw e;
        }
    }

    private void pauseForTests() {
        String ms = System.getenv(PAUSE_HOOK);
        if (ms == null || ms.isBlank()) {
            return;
        }
        notices.note(new Notice(
                Notice.Kind.INFO, "database committed; pausing " + ms + " ms before the index (" + PAUSE_HOOK + ")"));
        try {
            Thread.sleep(Long.parseLong(ms.strip()));
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        } catch (NumberFormatException e) {
            notices.note(
                    new Notice(Notice.Kind.WARNING, PAUSE_HOOK + " is not a number of milliseconds; not " + "pausing"));
        }
    }

    @Override
    public void close() {
        archive.close();
    }
}
