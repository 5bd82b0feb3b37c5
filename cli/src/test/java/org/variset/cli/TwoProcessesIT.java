package org.variset.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.variset.app.Workspace;
import org.variset.sample.generate.SampleGenerator;

/**
 * Two real processes on one archive: while one imports, the other is told which process on which host has the
 * archive, after waiting briefly, instead of hanging or touching it; when the first is done, all is there and sound.
 */
@Tag("slow")
class TwoProcessesIT {
    @TempDir
    Path dir;

    @Test
    void answersInUseByProcessNOnHostH() throws Exception {
        Path archive = dir.resolve("archive");
        Path files = dir.resolve("files");
        SampleGenerator.Summary s =
                SampleGenerator.write(new SampleGenerator.Options(1, 1, 5, LocalDate.of(2026, 6, 30), false), files);
        CliRun.run(dir, "--archive", archive.toString(), "init").exits(ExitCode.OK);
        Path log = dir.resolve("import.log");
        Process importing = ChildProcess.start(
                log,
                Map.of(Workspace.PAUSE_HOOK, "15000"),
                "--archive",
                archive.toString(),
                "import",
                files.resolve("walls.csv").toString(),
                files.resolve("routes.csv").toString(),
                files.resolve("holds.csv").toString());
        assertThat(ChildProcess.awaitLine(log, "database committed", importing, 120_000))
                .as(Files.readString(log))
                .isTrue();

        CliRun here = CliRun.run(dir, "--archive", archive.toString(), "info").exits(ExitCode.ARCHIVE);
        assertThat(here.err())
                .contains("is in use by process " + importing.pid() + " on host ")
                .contains("Wait for it to finish and try again.");
        Path other = dir.resolve("other.log");
        assertThat(ChildProcess.run(other, Map.of(), "--archive", archive.toString(), "search", "dyno"))
                .isEqualTo(3);
        assertThat(Files.readString(other)).contains("is in use by process " + importing.pid());

        assertThat(importing.waitFor(2, TimeUnit.MINUTES)).isTrue();
        assertThat(importing.exitValue()).as(Files.readString(log)).isZero();
        assertThat(CliRun.run(dir, "--archive", archive.toString(), "info", "--format", "json")
                        .exits(ExitCode.OK)
                        .out())
                .contains("\"routes\" : " + s.routes());
        CliRun.run(dir, "--archive", archive.toString(), "check").exits(ExitCode.OK);
    }
}
