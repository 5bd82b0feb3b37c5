package org.variset.archive.bulk;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.sql.SQLException;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.hibernate.Session;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.variset.archive.fixture.ResetFixture;
import org.variset.archive.grade.Discipline;
import org.variset.archive.grade.GradeReader;
import org.variset.archive.gym.Gym;
import org.variset.archive.gym.Wall;
import org.variset.archive.route.HoldPlacement;
import org.variset.archive.route.HoldRole;
import org.variset.archive.route.HoldSize;
import org.variset.archive.route.Reset;
import org.variset.archive.route.Route;
import org.variset.archive.route.Setter;
import org.variset.archive.store.Archive;
import org.variset.archive.store.ArchiveQueries;
import org.variset.archive.testing.TestArchives;

/** Rows written by JDBC batches read back through Hibernate exactly, and share the id sequences with it safely. */
class BulkInsertsTest {
    private static final LocalDate DAY = LocalDate.of(2026, 5, 4);

    private Archive archive;

    @BeforeEach
    void open() {
        archive = TestArchives.fresh();
        archive.inTransaction(ResetFixture::storeFullReset);
    }

    @AfterEach
    void close() {
        archive.close();
    }

    @Test
    void routesWrittenInBatchesReadBackAsTheEntitiesTheyCameFrom() {
        List<HoldPlacement.Spec> specs = List.of(
                new HoldPlacement.Spec(1, HoldRole.START, "jug", HoldSize.L, List.of(0.0), "J12", 1.2, 0.8, Map.of()),
                new HoldPlacement.Spec(
                        2,
                        HoldRole.HAND,
                        "pinch",
                        HoldSize.M,
                        List.of(90.0, 270.0),
                        "P7",
                        1.9,
                        1.85,
                        Map.of("colour", "teal")),
                new HoldPlacement.Spec(null, HoldRole.FOOT, "foot-chip", null, List.of(), null, null, null, Map.of()));
        archive.inTransaction(s -> {
            Wall wall = wall(s);
            Reset reset = new Reset(wall, "Cave 2026-05-04", DAY);
            Route route = new Route(
                    reset,
                    "  Red 9 ",
                    DAY,
                    Discipline.BOULDER,
                    GradeReader.standard().read("6B", Discipline.BOULDER, null, Set.of()));
            route.setMoves(List.of("gaston", "heel hook"));
            route.setMoveDifficulty(List.of(2, 7));
            route.setNotes("   ");
            route.setExtraFields(Map.of("tag", "R-9"));
            Long existing = s.createSelectionQuery("from Setter where name = :n", Setter.class)
                    .setParameter("n", "Inês Varga")
                    .getSingleResult()
                    .id();
            s.doWork(c -> {
                try (BulkInserts bulk = new BulkInserts(c)) {
                    long setter = bulk.setter(new Setter("Rui Anker"));
                    long resetId = bulk.reset(reset, wall.gym().id(), wall.id());
                    long routeId = bulk.route(route, wall.gym().id(), wall.id(), resetId, List.of(setter, existing));
                    for (int i = 0; i < specs.size(); i++) {
                        bulk.hold(routeId, i, specs.get(i));
                    }
                    assertThat(List.of(bulk.routes(), bulk.holds())).containsExactly(1L, 3L);
                }
            });
        });
        archive.inTransaction(s -> {
            ArchiveQueries q = new ArchiveQueries(s);
            Reset reset = q.reset(wall(s).gym(), "Cave 2026-05-04").orElseThrow();
            List<Route> routes = q.routesOfReset(reset);
            assertThat(routes).hasSize(1);
            Route r = routes.get(0);
            assertThat(r.label()).isEqualTo("Red 9");
            assertThat(r.gradeText()).isEqualTo("6B");
            assertThat(r.setters()).extracting(Setter::name).containsExactly("Rui Anker", "Inês Varga");
            assertThat(r.moves()).containsExactly("gaston", "heel hook");
            assertThat(r.moveDifficulty()).containsExactly(2, 7);
            assertThat(r.notes()).isNull();
            assertThat(r.extraFields()).isEqualTo(Map.of("tag", "R-9"));
            assertThat(r.holds()).extracting(HoldPlacement::spec).containsExactlyElementsOf(specs);
        });
    }

    @Test
    void hibernateAndTheBatchesNeverHandOutTheSameIdTwice() {
        List<Long> ids = new ArrayList<>();
        for (int round = 0; round < 3; round++) {
            int r = round;
            archive.inTransaction(s -> {
                Wall wall = wall(s);
                Reset viaHibernate = new Reset(wall, "Hibernate " + r, DAY.plusDays(r));
                s.persist(viaHibernate);
                for (int i = 0; i < 60; i++) {
                    Route route = new Route(
                            viaHibernate,
                            "H" + r + "-" + i,
                            DAY,
                            Discipline.BOULDER,
                            GradeReader.standard().read("V3", Discipline.BOULDER, null, Set.of()));
                    s.persist(route);
                    s.flush();
                    ids.add(route.id());
                }
                s.doWork(c -> {
                    try (BulkInserts bulk = new BulkInserts(c)) {
                        long resetId = bulk.reset(
                                new Reset(wall, "Batch " + r, DAY), wall.gym().id(), wall.id());
                        for (int i = 0; i < 60; i++) {
                            Route route = new Route(
                                    viaHibernate,
                                    "B" + r + "-" + i,
                                    DAY,
                                    Discipline.BOULDER,
                                    GradeReader.standard().read("V3", Discipline.BOULDER, null, Set.of()));
                            ids.add(bulk.route(route, wall.gym().id(), wall.id(), resetId, List.of()));
                        }
                    }
                });
            });
        }
        assertThat(ids).hasSize(360).doesNotHaveDuplicates();
        long stored = archive.fromTransaction(s -> s.createSelectionQuery("select count(r) from Route r", Long.class)
                .getSingleResult());
        assertThat(stored).isEqualTo(362);
    }

    @Test
    void refusesANameThatIsNotASequence() throws SQLException {
        archive.inTransaction(s -> s.doWork(c -> {
            IdBlocks ids = new IdBlocks(c);
            assertThatThrownBy(() -> ids.next("route_seq; DROP TABLE route"))
                    .isInstanceOf(IllegalArgumentException.class);
        }));
    }

    private static Wall wall(Session s) {
        Gym gym = new ArchiveQueries(s).gym(ResetFixture.GYM).orElseThrow();
        return new ArchiveQueries(s).wall(gym, "Cave Ôrla").orElseThrow();
    }
}
