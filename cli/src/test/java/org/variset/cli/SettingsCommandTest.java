package org.variset.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code variset settings} on the invented Fernhollow gym: values with the day they took effect. */
class SettingsCommandTest {
    private static final Path FILES = Path.of("src/test/resources/org/variset/cli/fernhollow");

    @TempDir
    Path home;

    private TestArchive archive;

    private CliRun run(String... args) {
        return archive.run(home, args);
    }

    @BeforeEach
    void importTheGym() {
        archive = TestArchive.fresh(home, "a");
        run("init").exits(ExitCode.OK);
        run(
                        "import",
                        FILES.resolve("walls.csv").toString(),
                        FILES.resolve("routes.csv").toString(),
                        FILES.resolve("holds.csv").toString())
                .exits(ExitCode.OK);
    }

    @Test
    void showsEveryDefaultWithItsSource() {
        String out = run("settings").exits(ExitCode.OK).out();
        assertThat(out)
                .contains("Settings of Fernhollow Climbing in effect on 2026-12-02")
                .contains("target (boulder)")
                .contains("VB=1 V0=2 V1=3 V2=4 V3=5 V4=6 V5=5 V6=4 V7=3 V8=1 V9=1")
                .contains("lookback_days")
                .contains("365  [default (docs/spec/metrics.md)]")
                .contains("cycle_days (wall Arch)   28  [walls file]");
    }

    /** An audit of a day before a change uses the settings of its day; one after it, the new value. */
    @Test
    void auditsEachDayWithTheSettingsOfThatDay() throws IOException {
        run("settings", "set", "lookback_days", "30", "--from", "2026-02-01").exits(ExitCode.OK);
        ObjectMapper m = new ObjectMapper();
        JsonNode after = m.readTree(
                run("audit", "--reset", "Arch 2026-02-02", "--format", "json").out());
        assertThat(after.requiredAt("/settings_used/lookback_days").asInt()).isEqualTo(30);
        // Boulders set in [2026-01-03, 2026-02-02): the three Arch routes of 01-05 and Bay's three (Spire's two rope
        // routes are not compared with a boulder reset, so they are not counted).
        assertThat(after.requiredAt("/repetition/window_routes").asInt()).isEqualTo(6);
        JsonNode before = m.readTree(
                run("audit", "--reset", "Arch 2026-01-05", "--format", "json").out());
        assertThat(before.requiredAt("/settings_used/lookback_days").asInt()).isEqualTo(365);
        assertThat(before.requiredAt("/repetition/window_routes").asInt()).isEqualTo(3);
    }

    @Test
    void keepsAHistoryAndGoesBackToTheDefault() {
        assertThat(run("settings", "set", "cycle_days", "21", "--wall", "Bay", "--from", "2026-01-01")
                        .exits(ExitCode.OK)
                        .out())
                .isEqualTo("From 2026-01-01, cycle_days of wall Bay of Fernhollow Climbing is " + "21.\n");
        run("settings", "clear", "cycle_days", "--wall", "Bay", "--from", "2026-06-01")
                .exits(ExitCode.OK);
        assertThat(run("settings", "--on", "2026-03-01").out())
                .contains("cycle_days (wall Bay)    21  [set from " + "2026-01-01]");
        assertThat(run("settings", "--on", "2026-07-01").out()).doesNotContain("wall Bay");
        assertThat(run("settings", "history").out())
                .contains("2026-01-01  cycle_days (wall Bay)  21")
                .contains("2026-06-01  cycle_days (wall Bay)  (default)");
    }

    @Test
    void readsAVocabularyFromAFile() throws IOException {
        Path terms = Files.writeString(home.resolve("terms.txt"), "[moves]\nbat hang: bathang\n");
        run("settings", "set", "vocabulary", "--file", terms.toString(), "--from", "2026-01-01")
                .exits(ExitCode.OK);
        assertThat(run("settings").out()).contains("the gym's own terms added");
    }

    @Test
    void explainsBadValuesAndScopes() {
        assertThat(run("settings", "set", "near_repeat_threshold", "1.5")
                        .exits(ExitCode.BAD_INPUT)
                        .err())
                .contains("variset settings set: setting near_repeat_threshold: '1.5' is not a valid value: it must "
                        + "be at most 1");
        assertThat(run("settings", "set", "target", "V1=1")
                        .exits(ExitCode.BAD_INPUT)
                        .err())
                .contains("give --discipline boulder or --discipline rope");
        assertThat(run("settings", "set", "treshold", "0.5")
                        .exits(ExitCode.BAD_INPUT)
                        .err())
                .contains("near_repeat_threshold");
        assertThat(run("settings", "set", "lookback_days").exits(ExitCode.USAGE).err())
                .contains("give the value");
    }
}
