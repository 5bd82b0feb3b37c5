package org.variset.archive.store;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.variset.archive.fixture.ResetFixture;
import org.variset.archive.gym.Gym;
import org.variset.archive.route.HoldPlacement;
import org.variset.archive.route.Route;
import org.variset.archive.schema.SchemaVersion;

/**
 * Opens the archive written by the first schema version, committed under {@code fixtures/archive-v1} and kept
 * for good: every later migration must bring it up to date without losing anything. The fixture was written
 * once by {@link #main} (the ResetFixture data) with schema version 1 and H2 2.5.252; its gym's time zone was later
 * set to the fixture's America/Denver by {@link #rezone}, in SQL that leaves the schema at version 1:
 *
 * <pre>
 * ./mvnw -q -pl archive-core test-compile dependency:build-classpath -Dmdep.outputFile=/tmp/cp.txt
 * java -cp archive-core/target/test-classes:archive-core/target/classes:$(cat /tmp/cp.txt) \
 *   org.variset.archive.store.ArchiveV1FixtureTest --rezone archive-core/src/test/resources/fixtures/archive-v1
 * </pre>
 */
class ArchiveV1FixtureTest {

    @Test
    void opensTheFirstSchemaVersionsArchiveAndReadsItsReset(@TempDir Path tmp) throws IOException {
        Path dir = tmp.resolve("archive");
        Files.createDirectories(dir);
        try (InputStream in = getClass().getResourceAsStream("/fixtures/archive-v1/archive.mv.db")) {
            Files.copy(in, dir.resolve("archive.mv.db"));
        }
        try (Archive archive = Archive.open(dir)) {
            assertThat(archive.schemaVersion().version()).isEqualTo(SchemaVersion.LATEST);
            ArchiveStats stats = archive.stats();
            assertThat(List.of(
                            stats.gyms(),
                            stats.walls(),
                            stats.resets(),
                            stats.routes(),
                            stats.holds(),
                            stats.setters()))
                    .containsExactly(1L, 1L, 1L, 2L, 5L, 2L);
            archive.inTransaction(s -> {
                ArchiveQueries q = new ArchiveQueries(s);
                Gym gym = q.gym(ResetFixture.GYM).orElseThrow();
                assertThat(gym.zone()).isEqualTo(ResetFixture.ZONE);
                List<Route> routes = q.standingSet(gym, ResetFixture.SET_ON.plusDays(1));
                assertThat(routes).extracting(Route::label).containsExactly("Blue 3", "Green 1");
                assertThat(routes.get(0).holds())
                        .extracting(HoldPlacement::grips)
                        .containsExactly(List.of(0.0), List.of(90.0, 270.0), List.of(), List.of(37.5));
                assertThat(routes.get(0).notes()).endsWith("ずっと");
            });
        }
    }

    /**
     * Writes the fixture; run once with schema version 1 and never again (the file is kept for good).
     *
     * @param args the folder to write the archive to
     */
    public static void main(String[] args) throws java.sql.SQLException {
        if (args.length == 2 && args[0].equals("--rezone")) {
            rezone(Path.of(args[1]));
            return;
        }
        try (Archive archive = Archive.create(Path.of(args[0]))) {
            archive.inTransaction(ResetFixture::storeFullReset);
        }
    }

    /** Sets the fixture gym's time zone to the fixture's, by SQL on the file (no migration runs). */
    static void rezone(Path folder) throws java.sql.SQLException {
        String url = "jdbc:h2:file:" + folder.toAbsolutePath().resolve("archive");
        try (java.sql.Connection c = java.sql.DriverManager.getConnection(url, "", "");
                java.sql.PreparedStatement u = c.prepareStatement("UPDATE gym SET time_zone = ? WHERE name = ?")) {
            u.setString(1, ResetFixture.ZONE.getId());
            u.setString(2, ResetFixture.GYM);
            if (u.executeUpdate() != 1) {
                throw new IllegalStateException("no gym " + ResetFixture.GYM + " in " + folder);
            }
        }
    }
}
