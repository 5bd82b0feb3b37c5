package org.variset.archive.grade;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class BandSetTest {
    private final GradeReader reader = GradeReader.standard();

    /** docs/spec/grades.md, "Default bands": the examples it gives, values on edges going up. */
    @ParameterizedTest(name = "Font {0} falls in {1}")
    @CsvSource({"6A, V2", "6B, V3", "6C, V5", "6C+, V6", "7B+, V9", "V0-, V0", "V0+, V0", "V17, V16"})
    void placesBoulderGradesInTheBandsOfTheSpec(String grade, String band) {
        double v = reader.read(grade, Discipline.BOULDER, null, Set.of()).ircra();
        assertThat(BandSet.defaults(Discipline.BOULDER).bandOf(v))
                .get()
                .extracting(Band::label)
                .isEqualTo(band);
    }

    /** docs/spec/grades.md: "A UIAA 7 (levels 13 and 14, value 13.5) falls in 6b+"; 6a is [10.5, 11.5). */
    @Test
    void placesRopeGradesInFrenchBands() {
        BandSet rope = BandSet.defaults(Discipline.ROPE);
        assertThat(rope.bandOf(13.5)).get().extracting(Band::label).isEqualTo("6b+");
        assertThat(rope.bandOf(10.5)).get().extracting(Band::label).isEqualTo("6a");
        assertThat(rope.bandOf(6.4)).get().extracting(Band::label).isEqualTo("<4");
        assertThat(rope.bands().get(1)).isEqualTo(new Band("4", 6.5, 7.5));
    }

    @Test
    void refusesOverlappingBands() {
        assertThatThrownBy(() -> new BandSet(List.of(new Band("a", null, 10.0), new Band("b", 9.0, null))))
                .hasMessageContaining("overlap");
    }

    @Test
    void leavesValuesInAGapOutside() {
        BandSet gappy = new BandSet(List.of(new Band("low", 1.0, 5.0), new Band("high", 6.0, 9.0)));
        assertThat(gappy.bandOf(5.5)).isEmpty();
        assertThat(gappy.bandOf(9.0)).isEmpty();
    }
}
