package org.variset.imports;

import static org.assertj.core.api.Assertions.assertThat;
import static org.variset.imports.ImportFiles.HOLDS_HEADER;
import static org.variset.imports.ImportFiles.ROUTES_HEADER;
import static org.variset.imports.ImportFiles.write;

import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.variset.archive.gym.Gym;
import org.variset.archive.route.Route;
import org.variset.archive.settings.SettingKey;
import org.variset.archive.settings.SettingsReader;
import org.variset.archive.settings.SettingsWriter;
import org.variset.archive.store.Archive;
import org.variset.archive.store.ArchiveQueries;
import org.variset.archive.testing.TestArchives;
import org.variset.imports.load.ArchiveImporter;
import org.variset.imports.load.ImportOptions;
import org.variset.imports.load.ImportProgress;

/**
 * An import reads each row with the vocabulary its gym had on its set date (docs/spec/interchange.md: the archive
 * stores the canonical term): the gym's own spellings become terms, from the day they took effect, and only for
 * that gym. The gyms and synonyms are invented.
 */
class GymVocabularyImportTest {
    private static final String OWN_TERMS = "[moves]\nheel hook: hooky heel\n[hold-types]\ncrimp: micro\n";

    @TempDir
    Path dir;

    private Archive archive;

    @BeforeEach
    void open() {
        archive = TestArchives.fresh();
    }

    @AfterEach
    void close() {
        archive.close();
    }

    private void run(Path... files) {
        new ArchiveImporter(archive).run(List.of(files), ImportOptions.defaults(), ImportProgress.NONE);
    }

    private void ownTermsFrom(String gym, String day) {
        long id = archive.fromTransaction(
                s -> new ArchiveQueries(s).gym(gym).orElseThrow().id());
        LocalDate from = LocalDate.parse(day);
        var before = new SettingsReader(archive.connection()).inEffectOn(id, from);
        archive.inTransaction(s -> {
            Gym g = new ArchiveQueries(s).gym(gym).orElseThrow();
            SettingsWriter.set(s, g, SettingKey.VOCABULARY, "", from, SettingKey.VOCABULARY.parse(OWN_TERMS), before);
        });
    }

    private Route route(String gym, String label) {
        return archive.fromTransaction(s -> {
            Route r = s.createSelectionQuery("from Route where label = :l and gym.name = :g", Route.class)
                    .setParameter("l", label)
                    .setParameter("g", gym)
                    .getSingleResult();
            r.holds().size();
            return r;
        });
    }

    @Test
    void storesTheGymsOwnSpellingAsItsTermFromTheDayItTookEffectAndForThatGymOnly() throws Exception {
        run(write(
                dir,
                "first.csv",
                ROUTES_HEADER + "\nQuarry Loft,Cave,Q0,2026-01-05,boulder,V2,,,,,,,,,\n"
                        + "Tidewater,Cave,T0,2026-01-05,boulder,V2,,,,,,,,,\n"));
        ownTermsFrom("Quarry Loft", "2026-03-01");
        Path routes = write(
                dir,
                "routes.csv",
                ROUTES_HEADER
                        + "\nQuarry Loft,Cave,Q1,2026-03-02,boulder,V3,,,,,,hooky heel;dyno,,,"
                        + "\nQuarry Loft,Cave,Q2,2026-02-01,boulder,V3,,,,,,hooky heel,,,"
                        + "\nTidewater,Cave,T1,2026-03-02,boulder,V3,,,,,,hooky heel,,,\n");
        Path holds = write(dir, "holds.csv", HOLDS_HEADER + "\nQuarry Loft,Q1,2026-03-02,1,hand,micro,s,0,,,\n");
        run(routes, holds);
        assertThat(route("Quarry Loft", "Q1").moves()).containsExactly("heel hook", "dyno");
        assertThat(route("Quarry Loft", "Q1").holds().get(0).type()).isEqualTo("crimp");
        assertThat(route("Quarry Loft", "Q2").moves())
                .as("set before the terms took effect")
                .containsExactly("hooky heel");
        assertThat(route("Tidewater", "T1").moves()).as("another gym").containsExactly("hooky heel");
    }
}
