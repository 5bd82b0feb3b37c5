package org.variset.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code variset user}: accounts of the web workspace, on an invented gym's archive. */
class UserCommandTest {
    @TempDir
    Path home;

    @Test
    void makesListsAndRemovesAccountsWithoutEverPrintingAPassword() throws Exception {
        TestArchive archive = TestArchive.fresh(home, "a");
        archive.run(home, "init").exits(ExitCode.OK);
        CliRun add = archive.runWithInput(
                        "granite stairs at dawn\n", home, "user", "add", "Mara", "--role", "admin", "--password-stdin")
                .exits(ExitCode.OK);
        assertThat(add.out()).contains("Made account 'mara' (admin, every gym).");
        archive.runWithInput(
                        "slab feet all day long\n",
                        home,
                        "user",
                        "add",
                        "tobin",
                        "--role",
                        "head-setter",
                        "--password-stdin")
                .exits(ExitCode.OK);

        CliRun list = archive.run(home, "user", "list").exits(ExitCode.OK);
        assertThat(list.out()).contains("mara", "admin", "tobin", "head_setter", "every gym");
        JsonNode json = new ObjectMapper()
                .readTree(archive.run(home, "user", "list", "--json")
                        .exits(ExitCode.OK)
                        .out());
        assertThat(json.path("accounts")).hasSize(2);
        assertThat(json.path("accounts").get(1).path("role").asText()).isEqualTo("head_setter");
        assertThat(json.toString()).doesNotContain("argon2", "granite", "slab feet");

        archive.run(home, "user", "remove", "tobin").exits(ExitCode.OK);
        assertThat(archive.run(home, "user", "list").out()).doesNotContain("tobin");
    }

    @Test
    void refusesWhatWouldLockEveryoneOutOrExposeAPassword() {
        TestArchive archive = TestArchive.fresh(home, "b");
        archive.run(home, "init").exits(ExitCode.OK);
        archive.runWithInput(
                        "granite stairs at dawn\n", home, "user", "add", "mara", "--role", "admin", "--password-stdin")
                .exits(ExitCode.OK);

        CliRun last = archive.run(home, "user", "remove", "mara").exits(ExitCode.BAD_INPUT);
        assertThat(last.err()).contains("only admin");
        CliRun weak = archive.runWithInput(
                        "short\n", home, "user", "add", "odile", "--role", "viewer", "--password-stdin")
                .exits(ExitCode.BAD_INPUT);
        assertThat(weak.err()).contains("at least 12 characters").doesNotContain("short\n");
        CliRun noTerminal =
                archive.run(home, "user", "add", "odile", "--role", "viewer").exits(ExitCode.BAD_INPUT);
        assertThat(noTerminal.err()).contains("--password-stdin");
        CliRun badRole = archive.runWithInput(
                        "granite stairs at dawn\n", home, "user", "add", "odile", "--role", "boss", "--password-stdin")
                .exits(ExitCode.BAD_INPUT);
        assertThat(badRole.err()).contains("viewer, setter, head_setter, admin");
        assertThat(archive.run(home, "user", "list").out()).doesNotContain("odile");
    }
}
