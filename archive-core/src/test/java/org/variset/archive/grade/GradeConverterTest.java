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
