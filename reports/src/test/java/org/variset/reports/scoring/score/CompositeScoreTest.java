package org.variset.reports.scoring.score;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.HashMap;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.variset.archive.settings.GymSettings;

class CompositeScoreTest {
    /** Worked by hand: 100 × (0.25·0.8 + 0.2·0.5 + 0.2·0.6 + 0.15·e^-0.5 + 0.2·0.9). */
    @Test
    void weighsAllFivePartsWithTheDefaults() {
        Map<String, Double> parts = Map.of(
                "grip", 0.8, "holds", 0.5, "moves", 0.6, "grades", CompositeScore.gradesPart(0.5), "novelty", 0.9);
        CompositeScore s = CompositeScore.of(parts, GymSettings.DEFAULT_SCORE_WEIGHTS);
        double expected = 100 * (0.25 * 0.8 + 0.2 * 0.5 + 0.2 * 0.6 + 0.15 * Math.exp(-0.5) + 0.2 * 0.9);
        assertThat(s.score()).isCloseTo(expected, within(1e-9));
        assertThat(s.dropped()).isEmpty();
    }

    /** A null part is dropped and the other weights rescaled: 0.25+0.2+0.2+0.2 = 0.85. */
    @Test
    void rescalesOverThePartsThatAreNotNull() {
        Map<String, Double> parts = new HashMap<>(Map.of("grip", 1.0, "holds", 0.0, "moves", 0.5, "novelty", 1.0));
        parts.put("grades", null);
        CompositeScore s = CompositeScore.of(parts, GymSettings.DEFAULT_SCORE_WEIGHTS);
        assertThat(s.score()).isCloseTo(100 * (0.25 + 0.2 * 0.5 + 0.2) / 0.85, within(1e-9));
        assertThat(s.dropped()).containsExactly("grades");
        assertThat(s.weightsUsed().values().stream()
                        .mapToDouble(Double::doubleValue)
                        .sum())
                .isCloseTo(1, within(1e-12));
    }

    @Test
    void hasNoScoreWithFewerThanThreeParts() {
        CompositeScore s = CompositeScore.of(Map.of("grip", 0.4, "novelty", 0.3), GymSettings.DEFAULT_SCORE_WEIGHTS);
        assertThat(s.score()).isNull();
        assertThat(s.dropped()).containsExactly("holds", "moves", "grades");
    }
}
