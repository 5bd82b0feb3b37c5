package org.variset.imports.table;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class ColumnsTest {
    /**
     * Edit distances of textbook pairs: kitten/sitting 3 (Levenshtein's standard example), ca/abc 3 under optimal
     * string alignment (its standard counter-example to full Damerau-Levenshtein, which gives 2), tpye/type 1
     * (one transposition, Damerau 1964).
     */
    @ParameterizedTest(name = "{0} -> {1}: {2}")
    @CsvSource({"kitten, sitting, 3", "ca, abc, 3", "tpye, type, 1", "set_onn, set_on, 1", "'', abc, 3"})
    void measuresEditDistance(String a, String b, int d) {
        assertThat(Columns.distance(a, b)).isEqualTo(d);
    }

    @ParameterizedTest(name = "{0} suggests {1}")
    @CsvSource({"set_onn, set_on", "tpye, type", "grad, grade", "colour, color", "strippedon, stripped_on"})
    void suggestsTheNearMiss(String typed, String known) {
        assertThat(Columns.nearest(typed, TableKind.ROUTES.columns())).isIn(known, null);
        assertThat(Columns.nearest(typed, java.util.List.of(known))).isEqualTo(known);
    }

    @ParameterizedTest
    @CsvSource({"bolt", "tag", "mat", "sponsor"})
    void keepsOtherNamesAsExtraColumns(String typed) {
        assertThat(Columns.nearest(typed, TableKind.HOLDS.columns())).isNull();
        assertThat(Columns.nearest(typed, TableKind.WALLS.columns())).isNull();
    }
}
