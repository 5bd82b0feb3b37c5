package org.variset.cli.command;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.variset.cli.CliRun;
import org.variset.cli.ExitCode;

/** The launcher's class-data sharing training run: every line of its script must succeed on the sample. */
@Tag("slow")
class TrainStartUpCommandTest {
    @TempDir
    Path home;

    @Test
    void runsEveryLineOfItsScriptQuietly() {
        CliRun r = CliRun.run(home, "train-start-up").exits(ExitCode.OK);
        assertThat(r.out()).isEmpty();
        assertThat(r.err()).isEmpty();
    }

    @Test
    void everyCommandOfTheScriptExists() {
        for (var line : TrainStartUpCommand.SCRIPT) {
            String name = CommandCatalog.get().commandName(line.toArray(String[]::new));
            if (name != null) {
                assertThat(CommandCatalog.get().commands().stream().map(CommandCatalog.Entry::name))
                        .as(line.toString())
                        .contains(name);
            }
        }
    }
}
