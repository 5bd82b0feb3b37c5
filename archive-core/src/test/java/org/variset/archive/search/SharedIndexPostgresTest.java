package org.variset.archive.search;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.util.List;
import org.hibernate.Session;
import org.hibernate.Transaction;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.variset.archive.changelog.ChangeLog;
import org.variset.archive.route.Route;
import org.variset.archive.server.ServerAddress;
import org.variset.archive.store.Archive;
import org.variset.archive.store.ArchiveLock;
import org.variset.archive.testing.TestArchives;
import org.variset.archive.vocabulary.Vocabulary;

/**
 * A shared archive on a real PostgreSQL server, with two clients each keeping its own index: what one writes, the
 * other's index catches up with, including a change that commits after a later-numbered one was already seen, and a
 * deletion. Runs only in the {@code postgresql} test executions.
 */
class SharedIndexPostgresTest {
    private ServerAddress server;
    private Archive writer;
    private Archive reader;

    @BeforeEach
    void twoClients(@TempDir Path cache) {
        server = TestArchives.newSchema();
        writer = Archive.openServer(server, cache.resolve("writer"), true, ArchiveLock.DEFAULT_WAIT);
        writer.inTransaction(SearchFixture::store);
        reader = Archive.openServer(server, cache.resolve("reader"), false, ArchiveLock.DEFAULT_WAIT);
    }

    @AfterEach
    void close() {
        reader.close();
        writer.close();
    }

    private static long hits(SearchIndex index, String query) {
        return index.search(
                        new SearchRequest(query, null, null, null, SearchOrder.RELEVANCE, 10, false),
                        Vocabulary.defaults())
                .total();
    }

    /** Adds a move to a route and records the change, in a transaction the caller commits. */
    private static void addMove(Session s, String label, String move) {
        Route r = s.createSelectionQuery("from Route where label = :l", Route.class)
                .setParameter("l", label)
                .getSingleResult();
        List<String> moves = new java.util.ArrayList<>(r.moves());
        moves.add(move);
        r.setMoves(moves);
        s.flush();
        ChangeLog.routes(s, List.of(r.id()));
        s.flush();
    }

    private static long newestChangeId(Archive a) throws Exception {
        try (var s = a.connection().createStatement();
                var rs = s.executeQuery("SELECT MAX(id) FROM route_change")) {
            rs.next();
            return rs.getLong(1);
        }
    }

    @Test
    void aChangeThatCommitsLateWithALowerIdIsNotSkipped() throws Exception {
        try (SearchIndex index = SearchIndex.of(reader)) {
            assertThat(index.sync(reader.connection(), IndexProgress.NONE).action())
                    .isEqualTo(IndexSync.Action.REBUILT);
            assertThat(index.ids()).hasSize(7);

            // The slow writer records its change first (lower id) and commits last.
            try (Session slow = writer.sessionFactory().openSession();
                    Session quick = writer.sessionFactory().openSession()) {
                Transaction slowTx = slow.beginTransaction();
                addMove(slow, "C1", "bicycle");
                long slowId = newestIdIn(slow);
                Transaction quickTx = quick.beginTransaction();
                addMove(quick, "C2", "flag");
                long quickId = newestIdIn(quick);
                quickTx.commit();
                assertThat(slowId).as("the late change has the lower id").isLessThan(quickId);

                index.sync(reader.connection(), IndexProgress.NONE);
                assertThat(hits(index, "flag")).isEqualTo(1);
                assertThat(hits(index, "bicycle")).isZero();
                assertThat(newestChangeId(reader)).isEqualTo(quickId);

                slowTx.commit();
            }
            // An index that remembered "everything up to id quickId" would never read the slow change.
            IndexSync s = index.sync(reader.connection(), IndexProgress.NONE);
            assertThat(s.action()).isEqualTo(IndexSync.Action.CAUGHT_UP);
            assertThat(hits(index, "bicycle")).isEqualTo(1);
            assertThat(hits(index, "flag")).isEqualTo(1);
        }
    }

    private static long newestIdIn(Session s) {
        return s.createNativeQuery("SELECT MAX(id) FROM route_change", Long.class)
                .getSingleResult();
    }

    @Test
    void anotherClientsDeletionRemovesTheDocument() throws Exception {
        try (SearchIndex index = SearchIndex.of(reader)) {
            index.sync(reader.connection(), IndexProgress.NONE);
            assertThat(hits(index, "route:C4")).isEqualTo(1);
            writer.inTransaction(s -> {
                Route c4 = s.createSelectionQuery("from Route where label = 'C4'", Route.class)
                        .getSingleResult();
                ChangeLog.routes(s, List.of(c4.id()));
                s.remove(c4);
            });
            assertThat(index.sync(reader.connection(), IndexProgress.NONE).action())
                    .isEqualTo(IndexSync.Action.CAUGHT_UP);
            assertThat(hits(index, "route:C4")).isZero();
            assertThat(index.ids()).hasSize(6);
            assertThat(index.sync(reader.connection(), IndexProgress.NONE).action())
                    .as("nothing new: nothing to do")
                    .isEqualTo(IndexSync.Action.CURRENT);
        }
    }

    @Test
    void anIndexOfAnArchiveMadeAgainInItsPlaceIsRebuilt(@TempDir Path cache) throws Exception {
        Path dir = cache.resolve("client");
        try (Archive a = Archive.openServer(server, dir, false, ArchiveLock.DEFAULT_WAIT);
                SearchIndex index = SearchIndex.of(a)) {
            index.sync(a.connection(), IndexProgress.NONE);
        }
        ServerAddress other = TestArchives.newSchema();
        try (Archive a = Archive.openServer(other, dir, true, ArchiveLock.DEFAULT_WAIT);
                SearchIndex index = SearchIndex.of(a)) {
            assertThat(index.sync(a.connection(), IndexProgress.NONE).notice()).contains("built from another archive");
            assertThat(index.ids()).isEmpty();
        }
    }

    @Test
    void twoProcessesOfOneClientDoNotShareAnIndexAtOnce(@TempDir Path cache) {
        Path dir = cache.resolve("client");
        try (Archive first = Archive.openServer(server, dir, false, ArchiveLock.DEFAULT_WAIT)) {
            org.assertj.core.api.Assertions.assertThatThrownBy(
                            () -> Archive.openServer(server, dir, false, java.time.Duration.ZERO))
                    .hasMessageContaining("This client's search index of " + server.shown())
                    .hasMessageContaining(
                            "is in use by process " + ProcessHandle.current().pid());
            assertThat(first.shared()).isTrue();
        }
    }
}
