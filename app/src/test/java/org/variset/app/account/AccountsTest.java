package org.variset.app.account;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.variset.app.Notices;
import org.variset.app.Workspace;
import org.variset.app.imports.ImportFiles;
import org.variset.archive.testing.TestArchives;
import org.variset.imports.load.ImportOptions;
import org.variset.imports.load.ImportProgress;

/** Accounts of an invented gym's archive. */
class AccountsTest {
    private static final Clock CLOCK = Clock.fixed(Instant.parse("2026-12-02T10:00:00Z"), ZoneOffset.UTC);
    private static final char[] GOOD = "pinch grip on the arete".toCharArray();

    @TempDir
    Path dir;

    @Test
    void addsListsSignsInAndRemoves() {
        try (Workspace w = Workspace.over(TestArchives.fresh(), CLOCK, Notices.NONE)) {
            Accounts accounts = new Accounts(w);
            accounts.add("Mara.Quill", Role.ADMIN, List.of(), GOOD);
            accounts.add("tobin", Role.VIEWER, List.of(), "slab feet all day".toCharArray());

            assertThat(accounts.list()).extracting(Account::name).containsExactly("mara.quill", "tobin");
            assertThat(accounts.list().get(0).createdAt()).isEqualTo(CLOCK.instant());
            assertThat(accounts.signIn("MARA.quill ", GOOD)).map(Account::role).contains(Role.ADMIN);
            assertThat(accounts.signIn("mara.quill", "pinch grip on the arete!".toCharArray()))
                    .isEmpty();
            assertThat(accounts.signIn("nobody", GOOD)).isEmpty();

            accounts.setPassword("tobin", "new tape on the volume".toCharArray());
            assertThat(accounts.signIn("tobin", "slab feet all day".toCharArray()))
                    .isEmpty();
            assertThat(accounts.signIn("tobin", "new tape on the volume".toCharArray()))
                    .isPresent();

            accounts.remove("tobin");
            assertThat(accounts.find("tobin")).isEmpty();
        }
    }

    @Test
    void refusesATakenNameABadNameAndAWeakPassword() {
        try (Workspace w = Workspace.over(TestArchives.fresh(), CLOCK, Notices.NONE)) {
            Accounts accounts = new Accounts(w);
            accounts.add("mara", Role.ADMIN, List.of(), GOOD);
            assertThatThrownBy(() -> accounts.add("MARA", Role.VIEWER, List.of(), GOOD))
                    .hasMessageContaining("already an account 'mara'");
            assertThatThrownBy(() -> accounts.add("<b>x</b>", Role.VIEWER, List.of(), GOOD))
                    .hasMessageContaining("cannot be an account name");
            assertThatThrownBy(() -> accounts.add("odile", Role.VIEWER, List.of(), "short".toCharArray()))
                    .hasMessageContaining("at least 12 characters");
            assertThat(accounts.list()).hasSize(1);
        }
    }

    @Test
    void keepsTheLastAdmin() {
        try (Workspace w = Workspace.over(TestArchives.fresh(), CLOCK, Notices.NONE)) {
            Accounts accounts = new Accounts(w);
            accounts.add("mara", Role.ADMIN, List.of(), GOOD);
            assertThatThrownBy(() -> accounts.remove("mara")).hasMessageContaining("only admin");
            assertThatThrownBy(() -> accounts.setRole("mara", Role.SETTER, List.of()))
                    .hasMessageContaining("only admin");
            accounts.add("odile", Role.ADMIN, List.of(), GOOD);
            accounts.remove("mara");
            assertThat(accounts.list()).extracting(Account::name).containsExactly("odile");
        }
    }

    @Test
    void limitsARoleToGymsTheArchiveHolds() throws Exception {
        Path routes = Files.writeString(
                dir.resolve("routes.csv"),
                "gym,wall,route,set_on,discipline,grade\nQuarry Loft,Cave,Q1,2026-03-02,boulder,V3\n",
                StandardCharsets.UTF_8);
        try (Workspace w = Workspace.over(TestArchives.fresh(), CLOCK, Notices.NONE)) {
            new ImportFiles(w).run(List.of(routes), ImportOptions.defaults(), ImportProgress.NONE);
            Accounts accounts = new Accounts(w);
            Account a = accounts.add("tobin", Role.SETTER, List.of("quarry loft"), GOOD);
            assertThat(a.gyms()).containsExactly("Quarry Loft");
            assertThat(a.reaches("Quarry Loft")).isTrue();
            assertThat(a.reaches("Kiln Yard")).isFalse();
            assertThatThrownBy(() -> accounts.add("odile", Role.SETTER, List.of("Kiln Yard"), GOOD))
                    .hasMessageContaining("no gym 'Kiln Yard'")
                    .hasMessageContaining("Quarry Loft");
        }
    }

    @Test
    void readsRolesAsTyped() {
        assertThat(Role.of("Head-Setter")).isEqualTo(Role.HEAD_SETTER);
        assertThat(Role.HEAD_SETTER.includes(Role.SETTER)).isTrue();
        assertThat(Role.VIEWER.includes(Role.SETTER)).isFalse();
        assertThatThrownBy(() -> Role.of("boss")).hasMessageContaining("viewer, setter, head_setter, admin");
    }
}
