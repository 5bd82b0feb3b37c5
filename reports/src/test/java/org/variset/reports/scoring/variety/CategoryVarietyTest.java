package org.variset.reports.scoring.variety;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Random;
import java.util.stream.LongStream;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvFileSource;
import org.junit.jupiter.params.provider.MethodSource;

class CategoryVarietyTest {
    private static Map<String, Long> counts(long... c) {
        Map<String, Long> m = new LinkedHashMap<>();
        for (int i = 0; i < c.length; i++) {
            m.put("c" + i, c[i]);
        }
        return m;
    }

    /**
     * Counts 4, 0, 3, 2, 6: H' = 1.309526 (the metrics issue). Expected values from SciPy 1.17.1:
     * {@code c=np.array([4,0,3,2,6]); p=c/c.sum(); H=stats.entropy(c)} then H/ln 4, 1-(p**2).sum(), exp(H),
     * 1/(p**2).sum(). Tolerance 1e-12.
     */
    @Test
    void matchesScipyOnASmallCountVector() {
        VarietyFigures v = CategoryVariety.of(counts(4, 0, 3, 2, 6), 0, 10);
        assertThat(v.richness()).isEqualTo(4);
        assertThat(v.shannon()).isCloseTo(1.3095258353040693, within(1e-12));
        assertThat(v.pielou()).isCloseTo(0.9446232142545792, within(1e-12));
        assertThat(v.giniSimpson()).isCloseTo(0.711111111111111, within(1e-12));
        assertThat(v.hillN1()).isCloseTo(3.7044167920465574, within(1e-12));
        assertThat(v.hillN2()).isCloseTo(3.4615384615384612, within(1e-12));
        assertThat(v.coverage()).isCloseTo(3.7044167920465574 / 10, within(1e-12));
    }

    @Test
    void dividesCoverageByTheObservationsWhenFewerThanTheVocabulary() {
        VarietyFigures v = CategoryVariety.of(counts(1, 1), 0, 10);
        assertThat(v.coverage()).isCloseTo(1.0, within(1e-12));
    }

    @Test
    void leavesFiguresNullWithNothingToCount() {
        VarietyFigures v = CategoryVariety.of(counts(0, 0), 5, 10);
        assertThat(v.shannon()).isNull();
        assertThat(v.missing()).isEqualTo(5);
        assertThat(v.undefined()).containsKeys("shannon", "coverage");
    }

    @Test
    void hasNoEvennessForOneCategory() {
        VarietyFigures v = CategoryVariety.of(counts(7), 0, null);
        assertThat(v.shannon()).isZero();
        assertThat(v.pielou()).isNull();
        assertThat(v.coverage()).isNull();
        assertThat(v.hillN1()).isEqualTo(1.0);
    }

    /** Hill (1973): N2 ≤ N1 ≤ S for any counts; the order of categories does not matter. */
    @ParameterizedTest(name = "seed {0}")
    @MethodSource("seeds")
    void keepsHillsOrderingForRandomCounts(long seed) {
        Random r = new Random(seed);
        long[] c =
                LongStream.range(0, 1 + r.nextInt(12)).map(i -> r.nextInt(20)).toArray();
        VarietyFigures v = CategoryVariety.of(counts(c), 0, 12);
        if (v.n() == 0) {
            return;
        }
        assertThat(v.hillN2()).isLessThanOrEqualTo(v.hillN1() + 1e-12);
        assertThat(v.hillN1()).isLessThanOrEqualTo(v.richness() + 1e-12);
        long[] reversed = LongStream.range(0, c.length)
                .map(i -> c[c.length - 1 - (int) i])
                .toArray();
        assertThat(CategoryVariety.of(counts(reversed), 0, 12).shannon()).isEqualTo(v.shannon());
    }

    /**
     * Seeded random count vectors, expected values from SciPy 1.17.1 ({@code scipy.stats.entropy}, NumPy sums):
     * src/test/resources/.../variety/make-scipy-cases.py, run as written in its first line. Pielou is empty in the
     * file (NaN there) for a single category, where it is undefined. Tolerance 1e-12.
     */
    @ParameterizedTest(name = "case {index}")
    @CsvFileSource(resources = "scipy-cases.csv", useHeadersInDisplayName = true)
    void agreesWithScipy(
            String counts, int richness, double shannon, double pielou, double giniSimpson, double n1, double n2) {
        long[] c = java.util.Arrays.stream(counts.split(";"))
                .mapToLong(Long::parseLong)
                .toArray();
        VarietyFigures v = CategoryVariety.of(counts(c), 0, 14);
        assertThat(v.richness()).isEqualTo(richness);
        assertThat(v.shannon()).isCloseTo(shannon, within(1e-12));
        if (Double.isNaN(pielou)) {
            assertThat(v.pielou()).isNull();
        } else {
            assertThat(v.pielou()).isCloseTo(pielou, within(1e-12));
        }
        assertThat(v.giniSimpson()).isCloseTo(giniSimpson, within(1e-12));
        assertThat(v.hillN1()).isCloseTo(n1, within(1e-11));
        assertThat(v.hillN2()).isCloseTo(n2, within(1e-11));
    }

    static Stream<Long> seeds() {
        return LongStream.rangeClosed(1, 30).boxed();
    }
}
