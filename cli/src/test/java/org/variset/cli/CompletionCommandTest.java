package org.variset.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The shell completion script, and the names it asks the archive for. */
class CompletionCommandTest {
    @TempDir
    Path home;

    @Test
    void printsABashScriptThatCompletesCommandsAndAsksForNames() {
        String script =
                CliRun.run(home, "completion", "bash").exits(ExitCode.OK).out();
        assertThat(script)
                .contains("function _complete_variset()")
                .contains("audit")
                .contains("--standing-on")
                .contains("completion --names \"$kind\"")
                .contains("complete -F _variset_with_names -o default variset ./variset");
        assertThat(CliRun.run(home, "completion", "zsh").exits(ExitCode.OK).out())
                .isEqualTo(script);
        assertThat(CliRun.run(home, "completion", "fish").exits(ExitCode.USAGE).err())
                .contains("bash or zsh");
    }

    @Test
    void namesTheWallsSettersAndResetsOfTheArchiveOneALine() {
        TestArchive archive = TestArchive.fresh(home, "names");
        archive.run(home, "init").exits(ExitCode.OK);
        archive.run(
                        home,
                        "import",
                        Path.of("../docs/spec/examples/routes.csv").toString(),
                        Path.of("../docs/spec/examples/holds.csv").toString())
                .exits(ExitCode.OK);
        assertThat(archive.run(home, "completion", "--names", "walls")
                        .exits(ExitCode.OK)
                        .out())
                .isEqualTo("North Arch\nSouth Lead\n");
        assertThat(archive.run(home, "completion", "--names", "setters")
                        .exits(ExitCode.OK)
                        .out())
                .contains("Kit Ames\n")
                .contains("Rui Sol\n");
        assertThat(archive.run(home, "completion", "--names", "gyms")
                        .exits(ExitCode.OK)
                        .out())
                .isEqualTo("Example Gym\n");
        assertThat(archive.run(home, "completion", "--names", "resets")
                        .exits(ExitCode.OK)
                        .out())
                .contains("N-2026-03-02");
        assertThat(archive.run(home, "completion", "--names", "holds")
                        .exits(ExitCode.USAGE)
                        .err())
                .contains("gyms, walls, setters, resets");
    }
}
