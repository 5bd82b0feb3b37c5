package org.variset.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class DemoCommandTest {
    @TempDir
    Path home;

    @Test
    void loadsTheSampleIntoItsOwnFolderAndCanRunAgain() {
        String out = home.resolve("demo").toString();
        CliRun first = CliRun.run(home, "demo", "--out", out).exits(ExitCode.OK);
        assertThat(first.out()).contains("Lantern Rock").contains("10 routes, 80 holds, 3 walls, 4 resets");
        CliRun again = CliRun.run(home, "demo", "--out", out).exits(ExitCode.OK);
        assertThat(again.out()).isEqualTo(first.out());
        CliRun info = CliRun.run(home, "--archive", out + "/archive", "info", "--format", "json").exits(ExitCode.OK);
        assertThat(info.out()).contains("\"routes\" : 10");
        assertThat(home.resolve(".local")).doesNotExist();
    }

    @Test
    void refusesAFolderHoldingSomeoneElsesFiles() throws Exception {
        Path dir = Files.createDirectories(home.resolve("mine"));
        Files.writeString(dir.resolve("notes.txt"), "keep me");
        CliRun r = CliRun.run(home, "demo", "--out", dir.toString()).exits(ExitCode.BAD_INPUT);
        assertThat(r.err()).contains("holds files the demo did not make");
        assertThat(Files.readString(dir.resolve("notes.txt"))).isEqualTo("keep me");
    }
}
