package org.variset.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class RootCommandTest {
    @TempDir
    Path home;

    @Test
    void listsTheCommandsWithOneLineEach() {
        CliRun r = CliRun.run(home, "--help").exits(ExitCode.OK);
        assertThat(r.out())
                .contains("init ")
                .contains("info ")
                .contains("grade ")
                .contains("Exit status:");
    }

    @Test
    void printsItsVersion() {
        CliRun r = CliRun.run(home, "--version").exits(ExitCode.OK);
        assertThat(r.out()).startsWith("variset ");
    }

    @Test
    void helpForOneCommandIsThatCommandsHelp() {
        CliRun r = CliRun.run(home, "help", "audit").exits(ExitCode.OK);
        assertThat(r.out()).contains("--standing-on").contains("--setter");
    }

    @Test
    void findsTheCommandAfterTheArchiveOptionAndItsValue() {
        Path archive = home.resolve("info");
        CliRun r = CliRun.run(home, "--archive", archive.toString(), "init").exits(ExitCode.OK);
        assertThat(r.out()).contains("Created an empty archive at " + archive);
        CliRun.run(home, "--archive", archive.toString(), "info").exits(ExitCode.OK);
    }

    @Test
    void suggestsTheNearestCommandForATypo() {
        CliRun r = CliRun.run(home, "gradee").exits(ExitCode.USAGE);
        assertThat(r.err()).contains("Did you mean").contains("grade");
    }
}
