package org.variset.app.change;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Instant;
import java.time.LocalDate;
import java.time.ZoneOffset;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.variset.app.Notices;
import org.variset.app.Workspace;
import org.variset.app.imports.ImportFiles;
import org.variset.app.settings.GymSettingsUse;
import org.variset.archive.change.RouteCorrection;
import org.variset.archive.route.Route;
import org.variset.archive.settings.SettingKey;
import org.variset.archive.testing.TestArchives;
import org.variset.imports.load.ImportOptions;
import org.variset.imports.load.ImportProgress;

/** An amendment reads moves with the gym's own vocabulary of the route's day, as an import does. Invented gym. */
class AmendRouteTest {
    private static final Clock CLOCK = Clock.fixed(Instant.parse("2026-12-02T10:00:00Z"), ZoneOffset.UTC);

    @TempDir
    Path dir;

    @Test
    void storesTheGymsOwnSpellingOfAMoveAsItsTerm() throws Exception {
        Path routes = Files.writeString(
                dir.resolve("routes.csv"),
                "gym,wall,route,set_on,discipline,grade\nQuarry Loft,Cave,Q1,2026-03-02,boulder,V3\n",
                StandardCharsets.UTF_8);
        try (Workspace w = Workspace.over(TestArchives.fresh(), CLOCK, Notices.NONE)) {
            new ImportFiles(w).run(List.of(routes), ImportOptions.defaults(), ImportProgress.NONE);
            new GymSettingsUse(w)
                    .set(
                            new GymSettingsUse.Scope(null, null, null, LocalDate.of(2026, 1, 1)),
                            SettingKey.VOCABULARY,
                            "[moves]\nheel hook: hooky heel\n");
            RouteCorrection c = new RouteCorrection(
                    null, null, null, List.of("hooky heel", "dyno"), null, null, null, false, null, null);
            RouteCorrection.Result r = new AmendRoute(w).amend(null, "Cave", "Q1", LocalDate.of(2026, 3, 2), c);
            assertThat(r.changed()).containsExactly("moves: [] -> [heel hook, dyno]");
            List<String> moves = w.archive()
                    .fromTransaction(
                            s -> List.copyOf(s.createSelectionQuery("from Route where label = 'Q1'", Route.class)
                                    .getSingleResult()
                                    .moves()));
            assertThat(moves).containsExactly("heel hook", "dyno");
        }
    }
}
