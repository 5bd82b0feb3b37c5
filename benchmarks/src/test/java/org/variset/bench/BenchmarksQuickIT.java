package org.variset.bench;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

/**
 * Runs the whole harness on tiny chains (--quick) against the jars of this build, so that it cannot rot between
 * benchmark runs. The figures are not checked (a loaded CI machine makes them meaningless); that every phase ran,
 * matched its baseline's results and wrote its row is.
 */
class BenchmarksQuickIT {
    @TempDir
    Path dir;

    @Test
    void everyPhaseRunsAndWritesItsRow() throws Exception {
        Path repo = Path.of(System.getProperty("variset.repo", ".."))
                .toAbsolutePath()
                .normalize();
        Path out = dir.resolve("BENCHMARKS.md");
        Files.writeString(out, "# Benchmarks\n\nHand-written text above.\n", StandardCharsets.UTF_8);
        int status = new CommandLine(new Benchmarks())
                .execute(
                        "--repo",
                        repo.toString(),
                        "--work",
                        dir.resolve("work").toString(),
                        "--quick",
                        "--out",
                        out.toString(),
                        "--command",
                        "quick test");
        assertThat(status).isZero();
        String md = Files.readString(out, StandardCharsets.UTF_8);
        assertThat(md)
                .startsWith("# Benchmarks\n\nHand-written text above.\n")
                .contains(
                        "by `quick test`",
                        "| import, small chain (holds/s) |",
                        "| import, large chain (holds/s) |",
                        "| import heap, large chain (live after GC) |",
                        "| search p50, large chain |",
                        "| search p95, large chain |",
                        "| audit one reset, warm (large vs small) |",
                        "| cold start: variset info vs bare picocli --version |",
                        "| PDF audit of a 60-route reset, two-year archive |");
        assertThat(Files.size(dir.resolve("work/annex-audit.pdf"))).isPositive();
    }
}
