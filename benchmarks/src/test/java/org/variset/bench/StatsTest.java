package org.variset.bench;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Percentiles checked against NumPy 2.4.6 {@code numpy.percentile} (its default "linear" method, definition 7 of
 * Hyndman and Fan 1996). Expected values printed by:
 * {@code python3 -c "import numpy as np; x=[3.1,0.4,2.2,9.9,5.0,1.7,4.4]; print(np.percentile(x,50),
 * np.percentile(x,95), np.percentile(x,0), np.percentile(x,100), np.percentile([1.0,2.0,3.0,4.0],50),
 * np.percentile([1.0,2.0,3.0,4.0],95))"} giving 3.1 8.429999999999996 0.4 9.9 2.5 3.8499999999999996.
 */
class StatsTest {
    private static final List<Double> SEVEN = List.of(3.1, 0.4, 2.2, 9.9, 5.0, 1.7, 4.4);
    private static final List<Double> FOUR = List.of(1.0, 2.0, 3.0, 4.0);

    @Test
    void agreesWithNumpyPercentile() {
        assertThat(Stats.percentile(SEVEN, 50)).isCloseTo(3.1, within(1e-12));
        assertThat(Stats.percentile(SEVEN, 95)).isCloseTo(8.429999999999996, within(1e-12));
        assertThat(Stats.percentile(SEVEN, 0)).isCloseTo(0.4, within(1e-12));
        assertThat(Stats.percentile(SEVEN, 100)).isCloseTo(9.9, within(1e-12));
        assertThat(Stats.median(FOUR)).isCloseTo(2.5, within(1e-12));
        assertThat(Stats.percentile(FOUR, 95)).isCloseTo(3.8499999999999996, within(1e-12));
    }

    @Test
    void refusesNoMeasurementsAndPercentilesOutsideTheRange() {
        assertThatThrownBy(() -> Stats.median(List.of())).hasMessageContaining("no measurements");
        assertThatThrownBy(() -> Stats.percentile(FOUR, 101)).hasMessageContaining("0 to 100");
    }
}
