package org.variset.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.variset.archive.testing.TestArchives;
import org.variset.sample.generate.SampleGenerator;

/**
 * Two clients of one shared archive, as two real processes with their own cache folders, import three gyms between
 * them at the same time (one client imports two gyms, one after the other); a third searches while they do. Then
 * every client's index holds exactly the database's routes. Needs the PostgreSQL test server ({@link TestArchives}).
 */
@Tag("slow")
class TwoClientsIT {
    private static final ObjectMapper JSON = new ObjectMapper();

    @TempDir
    Path dir;

    private Map<String, String> client(String name) {
        return Map.of("XDG_CACHE_HOME", dir.resolve("cache-" + name).toString());
    }

    private static String[] importOf(String url, Path files) {
        return new String[] {
            "--db",
            url,
            "import",
            files.resolve("walls.csv").toString(),
            files.resolve("routes.csv").toString(),
            files.resolve("holds.csv").toString()
        };
    }

    @Test
    void bothIndexesEndInStepWithTheDatabase() throws Exception {
        Path all = dir.resolve("all");
        SampleGenerator.Summary s =
                SampleGenerator.write(new SampleGenerator.Options(3, 1, 12, LocalDate.of(2026, 6, 30), false), all);
        List<Path> gyms = new ArrayList<>();
        for (int g = 1; g <= 3; g++) {
            gyms.add(SharedArchivePostgresTest.splitByGym(
                    all, String.format("Synthetic Gym %03d", g), dir.resolve("gym-" + g)));
        }
        String url = TestArchives.url(TestArchives.newSchema());
        assertThat(ChildProcess.run(dir.resolve("init.log"), client("a"), "--db", url, "init"))
                .isZero();

        Process a = ChildProcess.start(dir.resolve("a.log"), client("a"), importOf(url, gyms.get(0)));
        Process b = ChildProcess.start(dir.resolve("b.log"), client("b"), importOf(url, gyms.get(1)));
        // A third client searches while they import: it must never fail, whatever it finds.
        for (int i = 0; i < 3 && (a.isAlive() || b.isAlive()); i++) {
            assertThat(ChildProcess.run(dir.resolve("c-" + i + ".log"), client("c"), "--db", url, "search", "crimp"))
                    .as(Files.readString(dir.resolve("c-" + i + ".log")))
                    .isZero();
        }
        assertThat(a.waitFor(5, TimeUnit.MINUTES)).isTrue();
        assertThat(b.waitFor(5, TimeUnit.MINUTES)).isTrue();
        assertThat(a.exitValue()).as(Files.readString(dir.resolve("a.log"))).isZero();
        assertThat(b.exitValue()).as(Files.readString(dir.resolve("b.log"))).isZero();
        assertThat(ChildProcess.run(dir.resolve("a2.log"), client("a"), importOf(url, gyms.get(2))))
                .as(Files.readString(dir.resolve("a2.log")))
                .isZero();

        long total = -1;
        for (String c : List.of("a", "b", "c")) {
            Path search = dir.resolve("search-" + c + ".json");
            assertThat(ChildProcess.run(search, client(c), "--db", url, "search", "crimp", "--format", "json"))
                    .isZero();
            long found = JSON.readTree(jsonPart(Files.readString(search)))
                    .get("total")
                    .asLong();
            assertThat(found).isPositive();
            if (total >= 0) {
                assertThat(found).as("client " + c).isEqualTo(total);
            }
            total = found;
            Path check = dir.resolve("check-" + c + ".log");
            assertThat(ChildProcess.run(check, client(c), "--db", url, "check"))
                    .as(Files.readString(check))
                    .isZero();
            assertThat(Files.readString(check)).contains(s.routes() + " documents, " + s.routes() + " routes");
        }
    }

    /** The JSON document in a log that may also hold notices on standard error. */
    private static String jsonPart(String log) {
        return log.substring(log.indexOf('{'), log.lastIndexOf('}') + 1);
    }
}
