package org.variset.archive.settings;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.math.BigDecimal;
import java.time.LocalDate;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.variset.archive.fixture.ResetFixture;
import org.variset.archive.grade.Discipline;
import org.variset.archive.gym.Gym;
import org.variset.archive.problem.InputException;
import org.variset.archive.problem.Remedy;
import org.variset.archive.read.ArchiveCatalog;
import org.variset.archive.read.GymRecord;
import org.variset.archive.read.WallRecord;
import org.variset.archive.store.Archive;
import org.variset.archive.store.ArchiveQueries;
import org.variset.archive.testing.TestArchives;
import org.variset.archive.vocabulary.VocabularyField;

class GymSettingsTest {

    @Nested
    class Values {
        @ParameterizedTest(name = "{0} = {1}")
        @CsvSource(
                delimiter = '|',
                value = {
                    "target|VB=1 V0=2 V1=3",
                    "bands|VB V0@10 V1@13.5 V2@14.5",
                    "near_repeat_threshold|0.65",
                    "lookback_days|180",
                    "reach_height_m|1.75",
                    "reach_factor|0.9",
                    "score_weights|grip=0.4 novelty=0.1",
                    "cycle_days|35",
                    "overdue_after_days|7"
                })
        void readBackAsTheyWereTyped(String key, String text) {
            SettingKey k = SettingKey.of(key);
            assertThat(k.text(k.parse(text))).isEqualTo(text);
        }

        @Test
        void acceptsCommasAndColonsBetweenPairs() {
            assertThat(SettingKey.TARGET.text(SettingKey.TARGET.parse("VB:1, V0:2")))
                    .isEqualTo("VB=1 V0=2");
        }

        @ParameterizedTest(name = "{0} = {1}")
        @CsvSource(
                delimiter = '|',
                value = {
                    "near_repeat_threshold|0|it must be above 0",
                    "near_repeat_threshold|1.5|it must be at most 1",
                    "lookback_days|-3|it is below 1",
                    "lookback_days|ten|not a whole number",
                    "target|VB=1 V0|'V0' is not a name=weight pair",
                    "target|VB=0|every weight is zero",
                    "score_weights|grip=1 style=2|'style' is not a part of the score",
                    "bands|VB V0@10 V1@9|not above the band before it",
                    "bands|VB V0|needs its lower edge",
                    "reach_height_m|12|it must be at most 3",
                    "target|VB=1 VB=2|given twice"
                })
        void refuseBadValuesSayingWhatWasExpected(String key, String text, String why) {
            assertThatThrownBy(() -> SettingKey.of(key).parse(text))
                    .isInstanceOf(IllegalArgumentException.class)
                    .hasMessageContaining(why)
                    .hasMessageContaining("expected");
        }

        @Test
        void namesEverySettingForAnUnknownKey() {
            assertThatThrownBy(() -> SettingKey.of("treshold")).hasMessageContaining("near_repeat_threshold");
        }

        @Test
        void checksAVocabularyExtensionLikeTheVocabularyFile() {
            assertThatThrownBy(() -> SettingKey.VOCABULARY.parse("[grips]\nup")).hasMessageContaining("line");
        }
    }

    @Nested
    class Defaults {
        private final GymSettings d = GymSettings.defaults();

        /** docs/spec/metrics.md sections 3, 5 and 6; docs/spec/grades.md default bands. */
        @Test
        void areThoseOfTheSpecs() {
            assertThat(d.nearRepeatThreshold()).isEqualTo(new BigDecimal("0.6"));
            assertThat(d.lookbackDays()).isEqualTo(365);
            assertThat(d.reachHeightM()).isEqualTo(1.60);
            assertThat(d.reachFactor()).isEqualTo(1.0);
            assertThat(d.scoreWeights())
                    .containsExactly(
                            java.util.Map.entry("grip", 0.25),
                            java.util.Map.entry("holds", 0.20),
                            java.util.Map.entry("moves", 0.20),
                            java.util.Map.entry("grades", 0.15),
                            java.util.Map.entry("novelty", 0.20));
            assertThat(d.target(Discipline.BOULDER)).isEqualTo(TargetPyramid.weights());
            assertThat(TargetPyramid.weights().values().stream()
                            .mapToDouble(Double::doubleValue)
                            .sum())
                    .isEqualTo(35);
            assertThat(d.targetIsDefault(Discipline.BOULDER)).isTrue();
            assertThat(d.target(Discipline.ROPE)).isNull();
            assertThat(d.bands(Discipline.BOULDER).labels()).startsWith("VB", "V0", "V1");
        }

        /** Outdoor Insider (Fall 2015, p. 15): boulders due at 4 weeks, overdue at 6; rope at 8 and 10. */
        @Test
        void resetCyclesFollowCommonPractice() {
            WallRecord plain = new WallRecord(1, 1, "Slab", null, null, null, null, null);
            assertThat(d.cycleDays(plain, Discipline.BOULDER)).isEqualTo(28);
            assertThat(d.cycleDays(plain, Discipline.BOULDER) + d.overdueAfterDays())
                    .isEqualTo(42);
            assertThat(d.cycleDays(plain, Discipline.ROPE)).isEqualTo(56);
            assertThat(d.cycleDays(plain, Discipline.ROPE) + d.overdueAfterDays())
                    .isEqualTo(70);
        }
    }

    @Nested
    class InTheArchive {
        private Archive archive;
        private GymRecord gym;
        private WallRecord cave;

        @BeforeEach
        void store() {
            archive = TestArchives.fresh();
            archive.inTransaction(ResetFixture::storeFullReset);
            ArchiveCatalog catalog = new ArchiveCatalog(archive.connection());
            gym = catalog.gym(null);
            cave = catalog.wall(gym, "Cave Ôrla");
        }

        @AfterEach
        void close() {
            archive.close();
        }

        private void set(SettingKey key, String scope, String from, String text) {
            SettingsReader reader = new SettingsReader(archive.connection());
            LocalDate day = LocalDate.parse(from);
            archive.inTransaction(s -> {
                Gym g = new ArchiveQueries(s).gym(gym.name()).orElseThrow();
                SettingsWriter.set(
                        s, g, key, scope, day, text == null ? null : key.parse(text), reader.inEffectOn(gym.id(), day));
            });
        }

        private GymSettings on(String day) {
            return new SettingsReader(archive.connection()).inEffectOn(gym.id(), LocalDate.parse(day));
        }

        @Test
        void useEachValueFromTheDayItTookEffect() {
            set(SettingKey.NEAR_REPEAT_THRESHOLD, "", "2026-03-01", "0.7");
            set(SettingKey.NEAR_REPEAT_THRESHOLD, "", "2026-06-01", "0.5");
            set(SettingKey.NEAR_REPEAT_THRESHOLD, "", "2026-09-01", null);
            assertThat(on("2026-02-28").nearRepeatThreshold()).isEqualTo(new BigDecimal("0.6"));
            assertThat(on("2026-03-01").nearRepeatThreshold()).isEqualTo(new BigDecimal("0.7"));
            assertThat(on("2026-08-31").nearRepeatThreshold()).isEqualTo(new BigDecimal("0.5"));
            assertThat(on("2026-09-01").nearRepeatThreshold()).isEqualTo(new BigDecimal("0.6"));
            assertThat(new SettingsReader(archive.connection()).history(gym.id()))
                    .extracting(SettingValue::text)
                    .containsExactly("0.7", "0.5", "(default)");
        }

        @Test
        void letTheLaterWriteWinOnTheSameDay() {
            set(SettingKey.LOOKBACK_DAYS, "", "2026-03-01", "100");
            set(SettingKey.LOOKBACK_DAYS, "", "2026-03-01", "200");
            assertThat(on("2026-03-01").lookbackDays()).isEqualTo(200);
        }

        @Test
        void takeAWallsOwnCycleBeforeTheWallsFileAndTheDiscipline() {
            set(SettingKey.CYCLE_DAYS, "boulder", "2026-01-01", "21");
            assertThat(on("2026-02-01").cycleDays(cave, Discipline.BOULDER)).isEqualTo(28); // walls file says 28
            set(SettingKey.CYCLE_DAYS, GymSettings.scopeOf(cave), "2026-01-01", "35");
            assertThat(on("2026-02-01").cycleDays(cave, Discipline.BOULDER)).isEqualTo(35);
            WallRecord noCycle = new WallRecord(cave.id() + 1, gym.id(), "Other", null, null, null, null, null);
            assertThat(on("2026-02-01").cycleDays(noCycle, Discipline.BOULDER)).isEqualTo(21);
        }

        @Test
        void checkATargetAgainstTheBandsInEffect() {
            assertThatThrownBy(() -> set(SettingKey.TARGET, "boulder", "2026-01-01", "V3=1 V3+=2"))
                    .hasMessageContaining("V3+ is not a band");
            set(SettingKey.BANDS, "boulder", "2026-01-01", "easy hard@17");
            set(SettingKey.TARGET, "boulder", "2026-01-01", "easy=2 hard=1");
            assertThat(on("2026-01-01").target(Discipline.BOULDER)).containsEntry("easy", 2.0);
            assertThat(on("2026-01-01")
                            .bands(Discipline.BOULDER)
                            .bandOf(18)
                            .orElseThrow()
                            .label())
                    .isEqualTo("hard");
        }

        @Test
        void refuseAValueForTheWrongScope() {
            assertThatThrownBy(() -> set(SettingKey.TARGET, "", "2026-01-01", "VB=1"))
                    .hasMessageContaining("one discipline")
                    .isInstanceOfSatisfying(
                            InputException.class,
                            e -> assertThat(e.remedy())
                                    .isEqualTo(Remedy.of(Remedy.Kind.CHOOSE_SCOPE, "scope", "discipline")));
            assertThatThrownBy(() -> set(SettingKey.LOOKBACK_DAYS, "rope", "2026-01-01", "10"))
                    .hasMessageContaining("whole gym");
        }

        @Test
        void extendTheVocabularyWithTheGymsTerms() {
            set(SettingKey.VOCABULARY, "", "2026-01-01", "[moves]\nheel hook: hooky heel\nbat hang");
            assertThat(on("2026-01-01").vocabulary().canonical(VocabularyField.MOVES, "hooky heel"))
                    .contains("heel hook");
            assertThat(on("2026-01-01").vocabulary().terms(VocabularyField.MOVES))
                    .contains("bat hang");
        }
    }
}
