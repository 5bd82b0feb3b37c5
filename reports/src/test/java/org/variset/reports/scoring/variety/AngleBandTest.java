package org.variset.reports.scoring.variety;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class AngleBandTest {
    /** docs/spec/metrics.md section 2: band k = [15k, 15k + 15), 90 in the last band [75, 90]. */
    @ParameterizedTest(name = "{0} degrees is band {1}")
    @CsvSource({"0, 0", "14.9, 0", "15, 1", "30, 2", "74.9, 4", "75, 5", "90, 5", "-10, -1", "-45, -3"})
    void placesAnglesInFifteenDegreeBands(double angle, int band) {
        assertThat(AngleBand.of(angle)).isEqualTo(band);
    }

    @ParameterizedTest
    @CsvSource({"-46", "91"})
    void refusesAnglesOutsideTheWallRange(double angle) {
        assertThatThrownBy(() -> AngleBand.of(angle)).hasMessageContaining("outside -45..90");
    }
}
