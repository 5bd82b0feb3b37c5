package org.variset.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.Comparator;
import java.util.Map;
import java.util.Random;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.variset.app.Workspace;
import org.variset.archive.store.Archive;
import org.variset.archive.store.ArchiveStats;
import org.variset.sample.generate.SampleGenerator;

/**
 * Crash safety: {@code variset import} runs as a child process and is killed (SIGKILL) at random moments, and on
 * every fourth run exactly between the database commit and the index commit. After every kill the archive opens,
 * holds all or none of that import, search agrees with the database, and the check finds it healthy. The count is
 * {@code -Dvariset.kills} (default 12 in CI; the full run is 50, see DEVELOPERS.md).
 */
@Tag("slow")
class KillDuringImportIT {
    private static final int KILLS = Integer.getInteger("variset.kills", 12);
    private static final ObjectMapper JSON = new ObjectMapper();

    @TempDir
    Path dir;

    @Test
    void keepsAllOrNothingOfAKilledImport() throws Exception {
        Path base = dir.resolve("base");
        Path sample = dir.resolve("sample");
        SampleGenerator.write(SampleGenerator.sample(), sample);
        Path more = dir.resolve("more");
        SampleGenerator.Summary extra =
                SampleGenerator.write(new SampleGenerator.Options(1, 1, 11, LocalDate.of(2026, 6, 30), false), more);
        CliRun.run(dir, "--archive", base.toString(), "init").exits(ExitCode.OK);
        CliRun.run(
                        dir,
                        "--archive",
                        base.toString(),
                        "import",
                        sample.resolve("walls.csv").toString(),
                        sample.resolve("routes.csv").toString(),
                        sample.resolve("holds.csv").toString())
                .exits(ExitCode.OK);
        ArchiveStats before = stats(base);
        Random r = new Random(20261202);
        int nothing = 0;
        int all = 0;
        int between = 0;
        for (int i = 0; i < KILLS; i++) {
            Path a = dir.resolve("run-" + i);
            boolean atTheSeam = i % 4 == 3;
            boolean imported = killOne(i, atTheSeam, a, base, more, before, extra, r);
            nothing += imported ? 0 : 1;
            all += imported && !atTheSeam ? 1 : 0;
            between += atTheSeam ? 1 : 0;
            deleteTree(a);
        }
        System.out.printf(
                "KillDuringImportIT: %d kills survived: %d before the commit (nothing imported), %d after it"
                        + " (everything), %d between the database commit and the index commit%n",
                KILLS, nothing, all, between);
        assertThat(between).isPositive();
    }

    /** Kills one import of {@code more} into a copy of the base archive; true when the import had committed. */
    private boolean killOne(
            int i,
            boolean atTheSeam,
            Path a,
            Path base,
            Path more,
            ArchiveStats before,
            SampleGenerator.Summary extra,
            Random r)
            throws Exception {
        copyTree(base, a);
        Path log = dir.resolve("run-" + i + ".log");
        Process p = ChildProcess.start(
                log,
                atTheSeam ? Map.of(Workspace.PAUSE_HOOK, "60000") : Map.of(),
                "--archive",
                a.toString(),
                "import",
                more.resolve("walls.csv").toString(),
                more.resolve("routes.csv").toString(),
                more.resolve("holds.csv").toString());
        if (atTheSeam) {
            assertThat(ChildProcess.awaitLine(log, "database committed", p, 120_000))
                    .as(Files.readString(log))
                    .isTrue();
        } else {
            Thread.sleep(300 + r.nextInt(14_000));
        }
        p.destroyForcibly();
        assertThat(p.waitFor(30, TimeUnit.SECONDS)).isTrue();
        ArchiveStats after = stats(a);
        boolean imported = after.routes() == before.routes() + extra.routes();
        assertThat(after.routes())
                .as("run %d: all or none of the routes", i)
                .isIn(before.routes(), before.routes() + extra.routes());
        assertThat(after.holds())
                .as("run %d: all or none of the holds", i)
                .isEqualTo(imported ? before.holds() + extra.holds() : before.holds());
        CliRun search = CliRun.run(
                        dir,
                        "--archive",
                        a.toString(),
                        "search",
                        "gym:\"Synthetic Gym 001\"",
                        "--limit",
                        "1",
                        "--format",
                        "json")
                .exits(ExitCode.OK);
        assertThat(JSON.readTree(search.out()).required("total").asLong())
                .as("run %d: search agrees", i)
                .isEqualTo(imported ? extra.routes() : 0);
        if (atTheSeam) {
            assertThat(search.err()).contains("The search index was behind the archive");
        }
        CliRun.run(dir, "--archive", a.toString(), "check").exits(ExitCode.OK);
        return imported;
    }

    private static ArchiveStats stats(Path a) {
        try (Archive x = Archive.open(a)) {
            return x.stats();
        }
    }

    static void copyTree(Path from, Path to) throws IOException {
        try (Stream<Path> s = Files.walk(from)) {
            for (Path p : s.toList()) {
                Path t = to.resolve(from.relativize(p).toString());
                if (Files.isDirectory(p)) {
                    Files.createDirectories(t);
                } else {
                    Files.copy(p, t);
                }
            }
        }
    }

    static void deleteTree(Path p) throws IOException {
        try (Stream<Path> s = Files.walk(p)) {
            for (Path x : s.sorted(Comparator.reverseOrder()).toList()) {
                Files.delete(x);
            }
        }
    }
}
