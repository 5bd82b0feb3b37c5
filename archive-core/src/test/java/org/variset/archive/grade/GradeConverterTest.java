package org.variset.archive.grade;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;

class GradeConverterTest {
    private final GradeReader reader = GradeReader.standard();
    private final GradeConverter converter = GradeConverter.standard();

    /** Draper et al. (2015), comparison table, row 17: 5.11d = 7a. */
    @Test
    void convertsYdsToFrenchExactly() {
        assertThat(converter.equivalents(reader.read("5.11d"), GradeScale.FRENCH))
                .containsExactly("7a");
    }

    /** IRCRA table, secondary transcription: V2 spans rows 15-16, where Font has 5+, 6A and 6A+. */
    @Test
    void convertsAGradeThatSpansRowsToEveryGradeOnThoseRows() {
        assertThat(converter.equivalents(reader.read("V2"), GradeScale.FONT)).containsExactly("5+", "6A", "6A+");
    }

    /**
     * docs/spec/grades.md, "Grade ranges": a grade shows itself in its own scale, though V2 and V3 share row 16 of the
     * table (Draper et al. 2015, secondary transcription); in another scale, the grades centred within its rows.
     */
    @Test
    void showsAGradeItselfInItsOwnScaleAndCentredGradesInAnother() {
        assertThat(converter.equivalents(reader.read("V2"), GradeScale.V)).containsExactly("V2");
        // Font 6B+ spans row 18 (18), 6C rows 18-19 (18.5); 6A+|6B on row 17 and 6C+ (19.5) lie outside 17.5..18.5.
        assertThat(converter.equivalents(reader.read("V4"), GradeScale.FONT)).containsExactly("6B+", "6C");
        // Font 6A+ (rows 16-17, 15.5 to 17.5): V2 (15.5) and V3 (16.5) are centred within it.
        assertThat(converter.equivalents(
                        reader.read("6A+", Discipline.BOULDER, null, java.util.Set.of()), GradeScale.V))
                .containsExactly("V2", "V3");
    }

    @Test
    void givesNothingWhereTheTargetColumnIsEmpty() {
        assertThat(converter.equivalents(reader.read("5.4"), GradeScale.V)).isEmpty();
    }

    @Test
    void namesGradesBeyondTheTableByExtendingTheTarget() {
        assertThat(converter.equivalents(reader.read("V17"), GradeScale.FRENCH)).containsExactly("9c");
        assertThat(converter.equivalents(reader.read("9c+"), GradeScale.YDS)).containsExactly("5.16a");
    }
}
