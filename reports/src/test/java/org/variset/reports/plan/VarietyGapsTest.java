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
        assertThat(ten.get(0).yearShare()).isCloseTo(0.20, within(1e-12));
        assertThat(VarietyGaps.of("holds", standing, year, 0.05))
                .extracting(VarietyGaps.Gap::category)
                .containsExactly("sloper", "crimp");
    }

    @Test
    void findsNothingWithoutAYearToCompareWith() {
        assertThat(VarietyGaps.of("moves", Map.of("dyno", 1L), Map.of(), 0.05)).isEmpty();
    }
}
