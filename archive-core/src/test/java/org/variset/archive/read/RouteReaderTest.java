package org.variset.archive.read;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.variset.archive.fixture.ResetFixture;
import org.variset.archive.grade.Discipline;
import org.variset.archive.route.HoldRole;
import org.variset.archive.route.HoldSize;
import org.variset.archive.store.Archive;
import org.variset.archive.testing.TestArchives;

class RouteReaderTest {
    private Archive archive;
    private RouteReader reader;
    private ArchiveCatalog catalog;

    @BeforeEach
    void storeTheFixture() {
        archive = TestArchives.fresh();
        archive.inTransaction(ResetFixture::storeFullReset);
        reader = new RouteReader(archive.connection());
        catalog = new ArchiveCatalog(archive.connection());
    }

    @AfterEach
    void close() {
        archive.close();
    }

    @Test
    void readsEveryFieldOfARouteWithItsHoldsAndSetters() {
        RouteRecord blue = reader.read(RouteFilter.all()).get(0);
        assertThat(blue.label()).isEqualTo("Blue 3");
        assertThat(blue.gym()).isEqualTo(ResetFixture.GYM);
        assertThat(blue.wall()).isEqualTo("Cave Ôrla");
        assertThat(blue.reset()).isEqualTo("Cave 2026-03-02");
        assertThat(blue.discipline()).isEqualTo(Discipline.BOULDER);
        assertThat(blue.gradeText()).isEqualTo("V4");
        assertThat(blue.ircra()).isEqualTo(18.0);
        assertThat(blue.angleDeg()).isEqualTo(30.0);
        assertThat(blue.setters()).containsExactly("Inês Varga", "Tomo Heikkilä");
        assertThat(blue.moves()).containsExactly("heel hook", "dyno", "match");
        assertThat(blue.moveDifficulty()).containsExactly(3, 4, 8, 3);
        assertThat(blue.holds()).hasSize(4);
        HoldRecord pinch = blue.holds().get(1);
        assertThat(pinch.type()).isEqualTo("pinch");
        assertThat(pinch.size()).isEqualTo(HoldSize.M);
        assertThat(pinch.grips()).containsExactly(90.0, 270.0);
        assertThat(pinch.holdRef()).isEqualTo("P7");
        assertThat(blue.handHoldsInOrder())
                .extracting(HoldRecord::role)
                .containsExactly(HoldRole.START, HoldRole.HAND, HoldRole.FINISH);
    }

    @Test
    void usesTheWallsAngleWhenTheRouteHasNone() {
        RouteRecord green = reader.read(RouteFilter.all()).get(1);
        assertThat(green.label()).isEqualTo("Green 1");
        assertThat(green.angleDeg()).isEqualTo(35.0);
        assertThat(green.setters()).containsExactly("Tomo Heikkilä");
    }

    @Nested
    class Filters {
        @Test
        void selectsTheRoutesStandingOnADay() {
            // Green 1 is up from 2026-03-03 until it came down on 2026-04-06 (that day it is no longer up).
            assertThat(labels(RouteFilter.all().standingOn(LocalDate.of(2026, 3, 2))))
                    .containsExactly("Blue 3");
            assertThat(labels(RouteFilter.all().standingOn(LocalDate.of(2026, 4, 5))))
                    .containsExactly("Blue 3", "Green 1");
            assertThat(labels(RouteFilter.all().standingOn(LocalDate.of(2026, 4, 6))))
                    .containsExactly("Blue 3");
        }

        @Test
        void selectsBySetterWindowAndReset() {
            long ines = catalog.setterId("Inês Varga");
            assertThat(labels(RouteFilter.all().withSetter(ines))).containsExactly("Blue 3");
            assertThat(labels(RouteFilter.all().setBetween(LocalDate.of(2026, 3, 3), LocalDate.of(2026, 3, 4))))
                    .containsExactly("Green 1");
            GymRecord gym = catalog.gym(null);
            ResetRecord reset = catalog.reset(gym, "Cave 2026-03-02");
            assertThat(labels(RouteFilter.reset(reset.id()))).containsExactly("Blue 3", "Green 1");
            assertThat(labels(RouteFilter.gym(gym.id()).withoutReset(reset.id())))
                    .isEmpty();
        }

        @Test
        void readsInChunksOfAscendingId() {
            List<List<String>> chunks = new ArrayList<>();
            long n = reader.forEachChunk(
                    RouteFilter.all(),
                    1,
                    c -> chunks.add(c.stream().map(RouteRecord::label).toList()));
            assertThat(n).isEqualTo(2);
            assertThat(chunks).containsExactly(List.of("Blue 3"), List.of("Green 1"));
        }
    }

    @Nested
    class Catalog {
        @Test
        void findsTheOnlyGymWithoutAName() {
            assertThat(catalog.gym(null).name()).isEqualTo(ResetFixture.GYM);
        }

        @Test
        void namesWhatThereIsWhenANameIsWrong() {
            GymRecord gym = catalog.gym(null);
            assertThatThrownBy(() -> catalog.wall(gym, "Slab")).hasMessageContaining("walls: Cave Ôrla");
            assertThatThrownBy(() -> catalog.reset(gym, "nope")).hasMessageContaining("latest: Cave 2026-03-02");
            assertThatThrownBy(() -> catalog.gym("Elsewhere")).hasMessageContaining(ResetFixture.GYM);
            assertThatThrownBy(() -> catalog.setterId("Nobody")).hasMessageContaining("Inês Varga");
        }

        @Test
        void findsTheLatestResetOnOrBeforeADay() {
            WallRecord wall = catalog.wall(catalog.gym(null), "Cave Ôrla");
            assertThat(catalog.latestResetOnOrBefore(wall.id(), LocalDate.of(2026, 3, 1)))
                    .isEmpty();
            assertThat(catalog.latestResetOnOrBefore(wall.id(), LocalDate.of(2026, 5, 1)))
                    .get()
                    .extracting(ResetRecord::label)
                    .isEqualTo("Cave 2026-03-02");
            assertThat(wall.cycleDays()).isEqualTo(28);
        }
    }

    private List<String> labels(RouteFilter f) {
        return reader.read(f).stream().map(RouteRecord::label).toList();
    }
}
