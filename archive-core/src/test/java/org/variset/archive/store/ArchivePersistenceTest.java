package org.variset.archive.store;

import static org.assertj.core.api.Assertions.assertThat;

import java.time.LocalDate;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.variset.archive.fixture.ResetFixture;
import org.variset.archive.grade.GradeScale;
import org.variset.archive.gym.Gym;
import org.variset.archive.gym.Wall;
import org.variset.archive.gym.WallDiscipline;
import org.variset.archive.route.HoldPlacement;
import org.variset.archive.route.HoldRole;
import org.variset.archive.route.HoldSize;
import org.variset.archive.route.Reset;
import org.variset.archive.route.Route;
import org.variset.archive.route.Setter;
import org.variset.archive.schema.SchemaVersion;
import org.variset.archive.testing.TestArchives;

class ArchivePersistenceTest {
    private Archive archive;

    @BeforeEach
    void openFreshArchive() {
        archive = TestArchives.fresh();
        archive.inTransaction(ResetFixture::storeFullReset);
    }

    @AfterEach
    void close() {
        archive.close();
    }

    @Test
    void readsAFullResetBackEqual() {
        archive.inTransaction(s -> {
            ArchiveQueries q = new ArchiveQueries(s);
            Gym gym = q.gym(ResetFixture.GYM).orElseThrow();
            Wall wall = q.wall(gym, "Cave Ôrla").orElseThrow();
            assertThat(wall.discipline()).isEqualTo(WallDiscipline.BOULDER);
            assertThat(List.of(wall.angleDeg(), wall.heightM(), wall.widthM())).containsExactly(35.0, 4.2, 9.5);
            assertThat(wall.cycleDays()).isEqualTo(28);
            assertThat(wall.extraFields()).isEqualTo(Map.of("mat", "dual-layer"));

            Reset reset = q.reset(gym, "Cave 2026-03-02").orElseThrow();
            assertThat(reset.resetOn()).isEqualTo(ResetFixture.SET_ON);
            List<Route> routes = q.routesOfReset(reset);
            assertThat(routes).extracting(Route::label).containsExactly("Blue 3", "Green 1");

            Route blue = routes.get(0);
            assertThat(blue.gradeText()).isEqualTo("V4");
            assertThat(blue.gradeScale()).isEqualTo(GradeScale.V);
            assertThat(blue.gradeIrcra()).isEqualTo(18.0);
            assertThat(blue.setters()).extracting(Setter::name).containsExactly("Inês Varga", "Tomo Heikkilä");
            assertThat(blue.moves()).containsExactly("heel hook", "dyno", "match");
            assertThat(blue.styles()).containsExactly("power", "coordination");
            assertThat(blue.moveDifficulty()).containsExactly(3, 4, 8, 3);
            assertThat(blue.notes()).isEqualTo("jump to the \"bucket\", then top out; ずっと");
            assertThat(blue.angleDeg()).isEqualTo(30.0);
            assertThat(blue.color()).isEqualTo("blue");
            assertThat(blue.extraFields()).containsExactly(Map.entry("tag", "B-3"), Map.entry("sponsor_free", "yes"));
            assertThat(blue.holds())
                    .extracting(HoldPlacement::spec)
                    .containsExactly(
                            new HoldPlacement.Spec(
                                    1, HoldRole.START, "jug", HoldSize.L, List.of(0.0), "J12", 1.2, 0.8, Map.of()),
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
                            new HoldPlacement.Spec(
                                    3, HoldRole.FOOT, "foot-chip", HoldSize.XS, List.of(), "F3", 1.3, 0.45, Map.of()),
                            new HoldPlacement.Spec(
                                    4,
                                    HoldRole.FINISH,
                                    "sloper",
                                    HoldSize.XL,
                                    List.of(37.5),
                                    null,
                                    null,
                                    null,
                                    Map.of()));

            Route green = routes.get(1);
            assertThat(green.strippedOn()).isEqualTo(LocalDate.of(2026, 4, 6));
            assertThat(green.effectiveAngleDeg()).isEqualTo(35.0);
            assertThat(green.gradeIrcra()).isEqualTo(16.5);
        });
    }

    @Test
    void countsWhatItHoldsWithoutHibernate() {
        ArchiveStats stats = archive.stats();
        assertThat(List.of(stats.gyms(), stats.walls(), stats.resets(), stats.routes(), stats.holds(), stats.setters()))
                .containsExactly(1L, 1L, 1L, 2L, 5L, 2L);
        assertThat(stats.firstSetOn()).isEqualTo(ResetFixture.SET_ON);
        assertThat(stats.lastSetOn()).isEqualTo(ResetFixture.SET_ON.plusDays(1));
        assertThat(stats.schemaVersion()).isEqualTo(SchemaVersion.LATEST);
    }

    @Nested
    class StandingSet {
        private List<String> standingOn(LocalDate d) {
            return archive.fromTransaction(s -> {
                ArchiveQueries q = new ArchiveQueries(s);
                Gym gym = q.gym(ResetFixture.GYM).orElseThrow();
                return q.standingSet(gym, d).stream().map(Route::label).toList();
            });
        }

        @Test
        void includesRoutesFromTheirSetOnDay() {
            assertThat(standingOn(ResetFixture.SET_ON)).containsExactly("Blue 3");
            assertThat(standingOn(ResetFixture.SET_ON.plusDays(1))).containsExactly("Blue 3", "Green 1");
        }

        @Test
        void excludesARouteOnItsStrippedOnDay() {
            assertThat(standingOn(LocalDate.of(2026, 4, 5))).containsExactly("Blue 3", "Green 1");
            assertThat(standingOn(LocalDate.of(2026, 4, 6))).containsExactly("Blue 3");
        }

        @Test
        void agreesWithTheRoutesOwnRule() {
            archive.inTransaction(s -> {
                ArchiveQueries q = new ArchiveQueries(s);
                Gym gym = q.gym(ResetFixture.GYM).orElseThrow();
                Wall wall = q.wall(gym, "Cave Ôrla").orElseThrow();
                for (LocalDate d = ResetFixture.SET_ON.minusDays(1);
                        d.isBefore(LocalDate.of(2026, 4, 8));
                        d = d.plusDays(1)) {
                    LocalDate day = d;
                    List<Route> all = q.routesSetBetween(gym, LocalDate.of(2000, 1, 1), LocalDate.of(2100, 1, 1));
                    assertThat(q.standingSet(wall, d))
                            .containsExactlyInAnyOrderElementsOf(
                                    all.stream().filter(r -> r.standingOn(day)).toList());
                }
            });
        }
    }

    @Test
    void findsTheLatestResetOnOrBeforeADate() {
        archive.inTransaction(s -> {
            ArchiveQueries q = new ArchiveQueries(s);
            Wall wall =
                    q.wall(q.gym(ResetFixture.GYM).orElseThrow(), "Cave Ôrla").orElseThrow();
            Reset later = new Reset(wall, "Cave April", LocalDate.of(2026, 4, 6));
            s.persist(later);
            assertThat(q.resetsOfWall(wall)).extracting(Reset::label).containsExactly("Cave 2026-03-02", "Cave April");
            assertThat(q.latestResetOnOrBefore(wall, LocalDate.of(2026, 4, 5)))
                    .get()
                    .extracting(Reset::label)
                    .isEqualTo("Cave 2026-03-02");
            assertThat(q.latestResetOnOrBefore(wall, LocalDate.of(2026, 4, 6)))
                    .get()
                    .extracting(Reset::label)
                    .isEqualTo("Cave April");
            assertThat(q.latestResetOnOrBefore(wall, LocalDate.of(2026, 3, 1))).isEmpty();
        });
    }
}
