package org.variset.sample.generate;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.variset.sample.SampleArchive;

class SampleGeneratorTest {
    @TempDir
    Path tmp;

    @Test
    void writesTheSameBytesForTheSameSeed() throws IOException {
        SampleGenerator.write(SampleGenerator.sample(), tmp.resolve("a"));
        SampleGenerator.write(SampleGenerator.sample(), tmp.resolve("b"));
        for (String f : List.of("walls.csv", "routes.csv", "holds.csv")) {
            assertThat(Files.readAllBytes(tmp.resolve("a").resolve(f)))
                    .as(f)
                    .isEqualTo(Files.readAllBytes(tmp.resolve("b").resolve(f)));
        }
    }

    /**
     * Snapshot: the committed sample is exactly what the generator writes (regenerate with
     * {@code variset generate --out ...}); it guards against an unintended change of the sample, not its content.
     */
    @Tag("snapshot")
    @Test
    void matchesTheCommittedSample() throws IOException {
        SampleGenerator.write(SampleGenerator.sample(), tmp.resolve("fresh"));
        List<Path> committed = SampleArchive.copyTo(tmp.resolve("committed"));
        for (Path c : committed) {
            assertThat(Files.readAllBytes(c))
                    .as(c.getFileName().toString())
                    .isEqualTo(Files.readAllBytes(tmp.resolve("fresh").resolve(c.getFileName())));
        }
    }

    @Test
    void writesAboutTwoYearsOfSevenWalls() {
        SampleGenerator.Summary s = SampleGenerator.write(SampleGenerator.sample(), tmp);
        assertThat(s.walls()).isEqualTo(7);
        assertThat(s.routes()).isBetween(1_300L, 1_700L);
        assertThat(s.holds()).isBetween(17_000L, 23_000L);
    }

    @Test
    void writesSyntheticGymsWithoutTheSamplesStories() throws IOException {
        SampleGenerator.Options o = new SampleGenerator.Options(2, 1, 7, LocalDate.of(2026, 6, 30), false);
        SampleGenerator.Summary s = SampleGenerator.write(o, tmp.resolve("x"));
        assertThat(s.gyms()).isEqualTo(2);
        String routes = Files.readString(tmp.resolve("x/routes.csv"));
        assertThat(routes)
                .contains("Synthetic Gym 001,")
                .contains("Synthetic Gym 002,")
                .doesNotContain(Stories.GYM)
                .doesNotContain(Stories.CRIMP_SETTER);
        assertThat(Files.readString(tmp.resolve("x/holds.csv"))).doesNotContain(",PW-");
        SampleGenerator.write(new SampleGenerator.Options(2, 1, 8, LocalDate.of(2026, 6, 30), false), tmp.resolve("y"));
        assertThat(Files.readString(tmp.resolve("y/routes.csv"))).isNotEqualTo(routes);
    }

    @Test
    void refusesSenselessSizes() {
        assertThatThrownBy(() -> new SampleGenerator.Options(0, 1, 1, LocalDate.of(2026, 1, 1), false))
                .hasMessageContaining("1 to 10000 gyms");
    }
}
