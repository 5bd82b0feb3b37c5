package org.variset.reports.scoring.profile;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class DifficultyProfileTest {
    /**
     * Worked by hand from docs/spec/metrics.md section 4 (population sd): 5;5;5 sd 0 steady; 3;4;6;3 mean 4, sd 1.2247,
     * CV 0.31, one move at or above 5.22: single crux; 2;3;9 mean 4.67, sd 3.09, only 9 ≥ 7.76: single crux;
     * 8;2;8;2 mean 5, sd 3, moves ≥ 8: two, multi crux; 4;5;6 mean 5, sd 0.816, CV 0.163, 6 ≥ 5.816: single
     * crux; 1;5;5;5 mean 4, sd 1.732, no move ≥ 5.732: sustained; 3;5 unclassified.
     */
    @ParameterizedTest(name = "{0} is {1}")
    @CsvSource({
        "5;5;5, STEADY",
        "3;4;6;3, SINGLE_CRUX",
        "2;3;9, SINGLE_CRUX",
        "8;2;8;2, MULTI_CRUX",
        "4;5;6, SINGLE_CRUX",
        "1;5;5;5, SUSTAINED",
        "3;5, UNCLASSIFIED",
        "10;9;10;9, STEADY"
    })
    void classifiesAsTheSpecDefines(String d, ProfileClass expected) {
        List<Integer> values =
                java.util.Arrays.stream(d.split(";")).map(Integer::parseInt).toList();
        assertThat(DifficultyProfile.classify(values)).isEqualTo(expected);
    }

    /** ln 4 / ln 4 = 1 for four equal classes; 0 for one class; null with none classified. */
    @Test
    void measuresTheSplitEntropy() {
        Map<ProfileClass, Long> all = DifficultyProfile.counts(List.of(
                List.of(5, 5, 5), List.of(3, 4, 6, 3), List.of(8, 2, 8, 2), List.of(2, 6, 3, 6, 2, 6, 2), List.of(1)));
        assertThat(all).containsEntry(ProfileClass.UNCLASSIFIED, 1L);
        assertThat(DifficultyProfile.splitEntropy(
                        DifficultyProfile.counts(List.of(List.of(5, 5, 5), List.of(5, 5, 5)))))
                .isZero();
        assertThat(DifficultyProfile.splitEntropy(DifficultyProfile.counts(List.of(List.of(1)))))
                .isNull();
        assertThat(DifficultyProfile.splitEntropy(Map.of(
                        ProfileClass.STEADY,
                        1L,
                        ProfileClass.SUSTAINED,
                        1L,
                        ProfileClass.SINGLE_CRUX,
                        1L,
                        ProfileClass.MULTI_CRUX,
                        1L)))
                .isCloseTo(1.0, within(1e-12));
    }
}
