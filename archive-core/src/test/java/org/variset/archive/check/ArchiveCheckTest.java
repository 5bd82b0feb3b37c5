package org.variset.archive.check;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.variset.archive.changelog.ChangeLog;
import org.variset.archive.fixture.ResetFixture;
import org.variset.archive.search.IndexProgress;
import org.variset.archive.search.SearchIndex;
import org.variset.archive.store.Archive;
import org.variset.archive.testing.TestArchives;

class ArchiveCheckTest {
    private Archive archive;
    private SearchIndex index;

    @BeforeEach
    void storeAndIndex() {
        archive = TestArchives.fresh();
        archive.inTransaction(s -> {
            ResetFixture.storeFullReset(s);
            s.flush();
            ChangeLog.routes(
                    s,
                    s.createSelectionQuery("select id from Route", Long.class).getResultList());
        });
        index = SearchIndex.inMemory();
        index.sync(archive.connection(), IndexProgress.NONE);
    }

    @AfterEach
    void close() {
        index.close();
        archive.close();
    }

    private List<String> problems() {
        return ArchiveCheck.run(archive, index).items().stream()
                .filter(i -> !i.ok())
                .map(i -> i.part() + ": " + i.name() + ": " + i.detail())
                .toList();
    }

    @Test
    void findsAFreshArchiveHealthy() {
        CheckReport r = ArchiveCheck.run(archive, index);
        assertThat(r.healthy()).as(problems().toString()).isTrue();
        assertThat(r.items())
                .extracting(CheckReport.Item::name)
                .contains(
                        "schema version",
                        "holds without their route",
                        "Lucene CheckIndex",
                        "change stamp",
                        "one document per route");
    }

    @Test
    void findsAHoldWhoseRouteIsGone() throws Exception {
        TestArchives.withoutForeignKeys(
                archive.connection(),
                "INSERT INTO hold_placement (id, route_id, ordinal,"
                        + " role, hold_type) VALUES (999, 424242, 0, 'HAND', 'jug')");
        assertThat(problems()).containsExactly("database: holds without their route: 1 found");
        assertThat(ArchiveCheck.run(archive, index).databaseHealthy()).isFalse();
    }

    /** After a crash between the database's commit and the index's: a note, not a problem (the next search syncs). */
    @Test
    void callsAnIndexThatIsOnlyBehindANoteAndTheArchiveHealthy() throws Exception {
        TestArchives.withoutForeignKeys(
                archive.connection(),
                "INSERT INTO route (id, gym_id, wall_id, reset_id,"
                        + " label, set_on, discipline, grade_text, grade_scale, grade_ircra) SELECT 778, gym_id, wall_id,"
                        + " reset_id, 'Late', set_on, discipline, grade_text, grade_scale, grade_ircra FROM route"
                        + " WHERE label = 'Green 1'");
        archive.inTransaction(s -> ChangeLog.routes(s, List.of(778L)));
        CheckReport r = ArchiveCheck.run(archive, index);
        assertThat(r.healthy()).as(r.items().toString()).isTrue();
        assertThat(r.hasNotes()).isTrue();
        assertThat(r.items())
                .filteredOn(CheckReport.Item::note)
                .extracting(CheckReport.Item::name)
                .containsExactly("change stamp", "one document per route");
    }

    @Test
    void findsAnIndexBehindTheDatabaseAndARouteItLacks() throws Exception {
        archive.inTransaction(s -> {
            Long id = s.createSelectionQuery("select id from Route where label = 'Blue 3'", Long.class)
                    .getSingleResult();
            s.createNativeMutationQuery("UPDATE route SET label = 'Blue 33' WHERE id = " + id)
                    .executeUpdate();
            ChangeLog.routes(s, List.of(id));
        });
        TestArchives.withoutForeignKeys(
                archive.connection(),
                "INSERT INTO route (id, gym_id, wall_id, reset_id,"
                        + " label, set_on, discipline, grade_text, grade_scale, grade_ircra) SELECT 777, gym_id, wall_id,"
                        + " reset_id, 'Ghost', set_on, discipline, grade_text, grade_scale, grade_ircra FROM route"
                        + " WHERE label = 'Green 1'");
        assertThat(problems())
                .anyMatch(p -> TestArchives.onPostgres()
                        ? p.startsWith("index: change stamp: index at transaction ")
                                && p.endsWith("; 1 routes changed since" + " (behind: the next search catches up)")
                        : p.startsWith("index: change stamp: index 2, database 3 (behind"))
                .anyMatch(p -> p.startsWith("index: one document per route: 2 documents, 3 routes; 1 routes missing"));
        CheckReport r = ArchiveCheck.run(archive, index);
        assertThat(r.databaseHealthy()).isTrue();
        // The ghost route has no change-log entry, so the next search would not add it: a problem, not a note.
        assertThat(r.healthy()).isFalse();
        index.rebuild(archive.connection(), IndexProgress.NONE, "repair");
        assertThat(problems()).isEmpty();
    }
}
