package org.variset.reports.plan;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

class VarietyGapsTest {
    /**
     * Worked by hand: over the year slopers are 20 of 100 placements (20%) and crimps 30 (30%); in the standing set
     * slopers are 2 of 40 (5%, 15 points behind) and crimps 10 of 40 (25%, 5 points behind). With a 10-point margin
     * only slopers are behind; with 5 points both are, slopers first.
     */
    @Test
    void listsCategoriesBehindTheirYearShareByTheMargin() {
        Map<String, Long> year = Map.of("sloper", 20L, "crimp", 30L, "jug", 50L);
        Map<String, Long> standing = Map.of("sloper", 2L, "crimp", 10L, "jug", 28L);
        List<VarietyGaps.Gap> ten = VarietyGaps.of("holds", standing, year, 0.10);
        assertThat(ten).extracting(VarietyGaps.Gap::category).containsExactly("sloper");
        assertThat(ten.get(0).standingShare()).isCloseTo(0.05, within(1e-12));
        assertThat(ten.get(0).baselineShare()).isCloseTo(0.20, within(1e-12));
        assertThat(VarietyGaps.of("holds", standing, year, 0.05))
                .extracting(VarietyGaps.Gap::category)
                .containsExactly("sloper", "crimp");
    }

    @Test
    void findsNothingWithoutAYearToCompareWith() {
        assertThat(VarietyGaps.of("moves", Map.of("dyno", 1L), Map.of(), 0.05)).isEmpty();
    }

    /**
     * Three ordinary resets and one with every grip facing up. Expected medians from NumPy 2.4.6:
     * {@code numpy.median([s.get(c, 0) / sum(s.values()) for s in sets])} per category gives down 0.1, left 0.1,
     * right 0.1, up 0.55; the pooled share of up is 25 of 40, 0.625 (worked by hand).
     */
    @Test
    void takesTheMedianShareOverResetsSoOneAllUpResetMovesItLittle() {
        List<Map<String, Long>> resets = List.of(
                Map.of("up", 6L, "left", 2L, "right", 2L),
                Map.of("up", 5L, "left", 3L, "down", 2L),
                Map.of("up", 4L, "right", 4L, "down", 2L),
                Map.of("up", 10L));
        Map<String, Double> median = VarietyGaps.medianShares(resets);
        assertThat(median).containsOnlyKeys("down", "left", "right", "up");
        assertThat(median.get("down")).isCloseTo(0.1, within(1e-12));
        assertThat(median.get("left")).isCloseTo(0.1, within(1e-12));
        assertThat(median.get("right")).isCloseTo(0.1, within(1e-12));
        assertThat(median.get("up")).isCloseTo(0.55, within(1e-12));
        // Up at 50% now is 5 points behind the median and 12.5 behind the pooled share: with a 10-point margin the
        // median asks for nothing, the pooled share would have asked for more grips facing up.
        Map<String, Double> now = Map.of("up", 0.5, "left", 0.2, "right", 0.2, "down", 0.1);
        assertThat(VarietyGaps.ofShares("grip", now, median, 0.10)).isEmpty();
        assertThat(VarietyGaps.ofShares("grip", now, Map.of("up", 0.625), 0.10))
                .extracting(VarietyGaps.Gap::category)
                .containsExactly("up");
    }

    @Test
    void leavesOutResetsWithNothingCounted() {
        assertThat(VarietyGaps.medianShares(List.of(Map.of(), Map.of("jug", 3L))))
                .containsExactly(Map.entry("jug", 1.0));
    }
}
