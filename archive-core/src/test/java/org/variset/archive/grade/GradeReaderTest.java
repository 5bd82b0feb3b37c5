package org.variset.archive.grade;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.Set;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvFileSource;
import org.junit.jupiter.params.provider.CsvSource;

class GradeReaderTest {
    private final GradeReader reader = GradeReader.standard();

    private Grade read(String text, Discipline d) {
        return reader.read(text, d, null, Set.of());
    }

    @Nested
    class IrcraTableExactColumns {
        /** Draper et al. (2015), comparison table: YDS column, exact. */
        @ParameterizedTest(name = "YDS {1} is IRCRA {0}")
        @CsvFileSource(resources = "draper2015-yds-french.csv", useHeadersInDisplayName = true)
        void readsEveryYdsGradeOnItsLevel(int ircra, String yds, String french) {
            Grade g = read(yds, Discipline.ROPE);
            assertThat(g.scale()).isEqualTo(GradeScale.YDS);
            assertThat(g.ircra()).isEqualTo(ircra);
        }

        /** Draper et al. (2015), comparison table: French sport column, exact (scale named: 5+ is ambiguous). */
        @ParameterizedTest(name = "French {2} is IRCRA {0}")
        @CsvFileSource(resources = "draper2015-yds-french.csv", useHeadersInDisplayName = true)
        void readsEveryFrenchGradeOnItsLevel(int ircra, String yds, String french) {
            Grade g = reader.read(french, Discipline.ROPE, GradeScale.FRENCH, Set.of());
            assertThat(g.ircra()).isEqualTo(ircra);
        }

        /** Draper et al. (2015): YDS and French of one row convert into each other exactly. */
        @ParameterizedTest(name = "YDS {1} converts to French {2}")
        @CsvFileSource(resources = "draper2015-yds-french.csv", useHeadersInDisplayName = true)
        void convertsYdsToFrenchRowByRow(int ircra, String yds, String french) {
            assertThat(GradeConverter.standard().equivalents(read(yds, null), GradeScale.FRENCH))
                    .containsExactly(french);
        }
    }

    /** IRCRA table, secondary transcription (docs/spec/grades.md): V, Font and UIAA cells are ranges. */
    @ParameterizedTest(name = "{0} {1} spans {2}..{3}")
    @CsvFileSource(resources = "secondary-ranges.csv", useHeadersInDisplayName = true)
    void readsSecondaryColumnsAsRanges(String scale, String grade, int low, int high, double value) {
        Grade g = reader.read(grade, null, GradeScale.parse(scale), Set.of());
        assertThat(g.lowLevel()).isEqualTo(low);
        assertThat(g.highLevel()).isEqualTo(high);
        assertThat(g.ircra()).isEqualTo(value);
    }

    @Nested
    class ScaleInference {
        @Test
        void readsUpperCaseLettersAsFrenchOnRope() {
            Grade g = read("6A+", Discipline.ROPE);
            assertThat(g.describe()).isEqualTo("French 6a+");
            assertThat(g.ircra()).isEqualTo(12);
        }

        @Test
        void readsLowerCaseLettersAsFontOnBoulder() {
            assertThat(read("6b+", Discipline.BOULDER).describe()).isEqualTo("Font 6B+");
        }

        @Test
        void separatesFontAndFrenchByCaseWithoutDiscipline() {
            assertThat(read("6C", null).scale()).isEqualTo(GradeScale.FONT);
            assertThat(read("6c", null).scale()).isEqualTo(GradeScale.FRENCH);
        }

        @Test
        void namesBothReadingsOfAnAmbiguousRopeGrade() {
            assertThatThrownBy(() -> read("5+", Discipline.ROPE))
                    .isInstanceOfSatisfying(GradeException.class, e -> {
                        assertThat(e.ambiguous()).isTrue();
                        assertThat(e.readings())
                                .extracting(Grade::scale)
                                .containsExactlyInAnyOrder(GradeScale.FRENCH, GradeScale.UIAA);
                    })
                    .hasMessageContaining("French 5+")
                    .hasMessageContaining("UIAA 5+");
        }

        @Test
        void readsPlainSixOnRopeAsUiaaBecauseFrenchHasNone() {
            Grade g = read("6", Discipline.ROPE);
            assertThat(g.scale()).isEqualTo(GradeScale.UIAA);
            assertThat(g.ircra()).isEqualTo(10);
        }

        @Test
        void letsTheGymsScalesSettleAnAmbiguity() {
            Grade g = reader.read("5+", Discipline.ROPE, null, Set.of(GradeScale.UIAA));
            assertThat(g.describe()).isEqualTo("UIAA 5+");
        }

        @Test
        void readsIrcraNumbersOnlyWhenNamed() {
            assertThatThrownBy(() -> read("25", Discipline.ROPE)).isInstanceOf(GradeException.class);
            assertThatThrownBy(() -> read("17", Discipline.ROPE)).isInstanceOf(GradeException.class);
            assertThat(reader.read("17.5", null, GradeScale.IRCRA, Set.of()).ircra())
                    .isEqualTo(17.5);
        }

        @Test
        void readsRomanUiaa() {
            assertThat(read("VII+", Discipline.ROPE).ircra()).isEqualTo(14.5);
            assertThat(read("vi-", Discipline.ROPE).ircra()).isEqualTo(9);
        }
    }

    @Nested
    class SpecialForms {
        @ParameterizedTest(name = "{0} reads as {1}")
        @CsvSource({
            // docs/spec/grades.md: slash grades are the mean of the two grades' values.
            "V3/4, 17.25",
            "6b/6b+, 13.5",
            "5.10a/b, 10.5",
            // docs/spec/grades.md: 5.10- means 5.10a/b, 5.10+ 5.10c/d, bare 5.10 the mean of a-d.
            "5.10-, 10.5",
            "5.10+, 12.5",
            "5.10, 11.5",
            // docs/spec/grades.md: older French letters. 4a with 4 and 4c with 4+ is common practice, from memory; the
            // b half a level between them is our even spacing, so that 5a and 5b are two grades.
            "4a, 7",
            "4b, 7.5",
            "4c, 8",
            "5a, 9",
            "5b, 9.5",
            "5c, 10",
        })
        void readsSlashAndShorthandGrades(String text, double expected) {
            Discipline d = text.startsWith("V") ? Discipline.BOULDER : Discipline.ROPE;
            GradeScale scale = Character.isDigit(text.charAt(0)) && !text.startsWith("5.") ? GradeScale.FRENCH : null;
            assertThat(reader.read(text, d, scale, Set.of()).ircra()).isCloseTo(expected, within(1e-12));
        }

        @Test
        void keepsAnUnlistedPlusAsAFlag() {
            Grade g = read("V4+", Discipline.BOULDER);
            assertThat(g.ircra()).isEqualTo(18);
            assertThat(g.modifier()).isEqualTo(GradeModifier.HARD);
            assertThat(read("V0+", Discipline.BOULDER).modifier()).isEqualTo(GradeModifier.NONE);
        }

        @ParameterizedTest(name = "{0} extends the axis to {1}")
        @CsvSource({"V17, 33", "5.15d, 33", "9c, 33", "9A, 33", "9c+, 34", "V18, 34"})
        void extendsTheAxisOneLevelPerStepBeyondTheTable(String text, double level) {
            Grade g = read(text, null);
            assertThat(g.beyondTable()).isTrue();
            assertThat(g.ircra()).isEqualTo(level);
        }

        @Test
        void keepsTheTextAsWritten() {
            assertThat(read(" v4 ", Discipline.BOULDER).text()).isEqualTo(" v4 ");
            assertThat(read(" v4 ", Discipline.BOULDER).canonical()).isEqualTo("V4");
        }
    }

    @Nested
    class BadGrades {
        @ParameterizedTest
        @CsvSource({"banana", "Vx", "V40", "5.", "6d", "5.9a", "XIX", "'   '", "V3/", "V4/3"})
        void rejectsTextThatIsNoGradeSayingWhatAGradeLooksLike(String text) {
            assertThatThrownBy(() -> read(text, null))
                    .isInstanceOf(GradeException.class)
                    .hasMessageContaining("expected a grade such as V4");
        }

        @Test
        void rejectsAGradeOfTheWrongScaleWhenTheScaleIsNamed() {
            assertThatThrownBy(() -> reader.read("V4", null, GradeScale.FONT, Set.of()))
                    .hasMessageContaining("is not a Font grade");
        }
    }
}
