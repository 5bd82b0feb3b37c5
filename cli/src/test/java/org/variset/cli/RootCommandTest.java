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
        assertThat(r.out()).contains("init ").contains("info ").contains("grade ").contains("Exit status:");
    }

    @Test
    void printsItsVersion() {
        CliRun r = CliRun.run(home, "--version").exits(ExitCode.OK);
        assertThat(r.out()).startsWith("variset ");
    }

    @Test
    void suggestsTheNearestCommandForATypo() {
        CliRun r = CliRun.run(home, "gradee").exits(ExitCode.USAGE);
        assertThat(r.err()).contains("Did you mean").contains("grade");
    }
}
