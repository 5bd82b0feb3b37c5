package org.variset.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Path;
import java.util.Map;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ArchiveCommandsTest {
    @TempDir
    Path home;

    @Test
    void initThenInfoShowsZeroCountsAndTheSchemaVersion() throws Exception {
        String dir = home.resolve("a").toString();
        CliRun init = CliRun.run(home, "--archive", dir, "init").exits(ExitCode.OK);
        assertThat(init.out()).contains("Created an empty archive at " + dir);
        CliRun info =
                CliRun.run(home, "--archive", dir, "info", "--format", "json").exits(ExitCode.OK);
        JsonNode j = new ObjectMapper().readTree(info.out());
        assertThat(j.required("schema_version").asInt()).isEqualTo(org.variset.archive.schema.SchemaVersion.LATEST);
        for (String key : new String[] {"gyms", "walls", "resets", "routes", "holds", "setters"}) {
            assertThat(j.get(key).asLong()).as(key).isZero();
        }
        assertThat(j.get("first_set_on").isNull()).isTrue();
    }

    @Test
    void saysNothingChangedWhenInitRunsTwice() {
        String dir = home.resolve("a").toString();
        CliRun.run(home, "--archive", dir, "init").exits(ExitCode.OK);
        CliRun again = CliRun.run(home, "--archive", dir, "init").exits(ExitCode.OK);
        assertThat(again.out()).contains("already an archive").contains("nothing changed");
    }

    @Test
    void saysHowToCreateAMissingArchive() {
        CliRun r = CliRun.run(home, "--archive", home.resolve("none").toString(), "info")
                .exits(ExitCode.ARCHIVE);
        assertThat(r.err()).contains("No archive at").contains("init");
        assertThat(r.err()).doesNotContain("\tat ");
    }

    @Test
    void printsNoLibraryLogLinesByDefault() {
        String dir = home.resolve("a").toString();
        CliRun init = CliRun.run(home, "--archive", dir, "init").exits(ExitCode.OK);
        CliRun info = CliRun.run(home, "--archive", dir, "info").exits(ExitCode.OK);
        assertThat(init.err() + info.err()).isEmpty();
        assertThat(init.out() + info.out()).doesNotContain("Flyway").doesNotContain("HHH");
    }

    @Nested
    class WhereTheArchiveLives {
        @Test
        void takesTheOptionFirst() {
            Map<String, String> env = Map.of(
                    "VARISET_ARCHIVE",
                    home.resolve("env").toString(),
                    "XDG_DATA_HOME",
                    home.resolve("xdg").toString());
            CliRun r = CliRun.run(env, home, "--archive", home.resolve("opt").toString(), "init")
                    .exits(ExitCode.OK);
            assertThat(r.out()).contains(home.resolve("opt").toString()).contains("from --archive");
        }

        @Test
        void takesTheEnvironmentVariableNext() {
            Map<String, String> env = Map.of(
                    "VARISET_ARCHIVE",
                    home.resolve("env").toString(),
                    "XDG_DATA_HOME",
                    home.resolve("xdg").toString());
            assertThat(CliRun.run(env, home, "init").exits(ExitCode.OK).out())
                    .contains(home.resolve("env").toString());
        }

        @Test
        void takesXdgDataHomeThen() {
            Map<String, String> env =
                    Map.of("XDG_DATA_HOME", home.resolve("xdg").toString());
            assertThat(CliRun.run(env, home, "init").exits(ExitCode.OK).out())
                    .contains(home.resolve("xdg/variset").toString());
        }

        @Test
        void fallsBackToTheHomeFolder() {
            assertThat(CliRun.run(home, "init").exits(ExitCode.OK).out())
                    .contains(home.resolve(".local/share/variset").toString());
        }

        @Test
        void letsTheOptionFollowTheSubcommand() {
            CliRun.run(home, "init", "--archive", home.resolve("late").toString())
                    .exits(ExitCode.OK);
            assertThat(home.resolve("late/archive.mv.db")).exists();
        }
    }
}
