package org.variset.reports.scoring.grades;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.stream.LongStream;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvFileSource;
import org.junit.jupiter.params.provider.MethodSource;
import org.variset.archive.grade.Band;
import org.variset.archive.grade.BandSet;
import org.variset.archive.grade.Discipline;
import org.variset.archive.settings.TargetPyramid;

class GradeDistributionTest {
    /** Four unit bands A..D centred on 0, 1, 2, 3. */
    private static final BandSet ABCD = new BandSet(List.of(
            new Band("A", null, 0.5), new Band("B", 0.5, 1.5), new Band("C", 1.5, 2.5), new Band("D", 2.5, null)));

    /** Six unit bands 1..6 centred on 1..6. */
    private static final BandSet SIX = new BandSet(List.of(
            new Band("1", null, 1.5),
            new Band("2", 1.5, 2.5),
            new Band("3", 2.5, 3.5),
            new Band("4", 3.5, 4.5),
            new Band("5", 4.5, 5.5),
            new Band("6", 5.5, null)));

    /** perBand[b] routes of value b (or of value b + offset). */
    private static double[] values(int... perBand) {
        return repeated(0, perBand);
    }

    private static double[] repeated(double offset, int... perBand) {
        double[] out = new double[java.util.Arrays.stream(perBand).sum()];
        int i = 0;
        for (int b = 0; b < perBand.length; b++) {
            for (int k = 0; k < perBand[b]; k++) {
                out[i++] = b + offset;
            }
        }
        return out;
    }

    private static Map<String, Double> target(double... shares) {
        Map<String, Double> t = new LinkedHashMap<>();
        String[] l = {"A", "B", "C", "D"};
        for (int i = 0; i < shares.length; i++) {
            t.put(l[i], shares[i]);
        }
        return t;
    }

    /**
     * SciPy 1.17.1: {@code wasserstein_distance([0,1,2,3],[0,1,2,3],[1,2,3,4],[4,3,2,1])} gives 1.0.
     * Tolerance 1e-12.
     */
    @Test
    void matchesScipysWassersteinDistance() {
        GradeFigures g = GradeDistribution.of(values(1, 2, 3, 4), ABCD, target(4, 3, 2, 1));
        assertThat(g.emdToTarget()).isCloseTo(1.0, within(1e-12));
    }

    /** SciPy 1.17.1: {@code chisquare([10,5,0,3],[6,6,3,3])} gives 5.833333 and p = 0.12000654765321464. */
    @Test
    void matchesScipysChiSquare() {
        GradeFigures g = GradeDistribution.of(values(10, 5, 0, 3), ABCD, target(2, 2, 1, 1));
        assertThat(g.chiSquare()).isCloseTo(5.833333333333333, within(1e-12));
        assertThat(g.chiSquareDf()).isEqualTo(3);
        assertThat(g.chiSquareP()).isCloseTo(0.12000654765321464, within(1e-12));
        assertThat(g.chiSquareReliable()).isFalse();
        assertThat(g.gaps()).containsExactly("C");
    }

    /** SciPy's documented example: {@code chisquare([16, 18, 16, 14, 12, 12])} gives 2.0 and p = 0.849145. */
    @Test
    void matchesScipysDocumentedChiSquareExample() {
        double[] v = repeated(1, 16, 18, 16, 14, 12, 12);
        Map<String, Double> even = new LinkedHashMap<>();
        SIX.labels().forEach(l -> even.put(l, 1.0));
        GradeFigures g = GradeDistribution.of(v, SIX, even);
        assertThat(g.chiSquare()).isCloseTo(2.0, within(1e-12));
        assertThat(g.chiSquareP()).isCloseTo(0.849145, within(5e-7));
        assertThat(g.chiSquareReliable()).isTrue();
    }

    @Test
    void countsRoutesOutsideTheTargetAndLeavesThemOut() {
        GradeFigures g = GradeDistribution.of(values(0, 2, 2, 5), ABCD, target(0, 1, 1));
        assertThat(g.outsideTarget()).isEqualTo(5);
        assertThat(g.emdToTarget()).isCloseTo(0, within(1e-12));
    }

    @Test
    void givesOnlyAHistogramWithoutATarget() {
        GradeFigures g = GradeDistribution.of(values(1, 1), ABCD, null);
        assertThat(g.histogram()).containsEntry("A", 1L).containsEntry("B", 1L);
        assertThat(g.emdToTarget()).isNull();
        assertThat(g.undefined()).containsKey("chi_square");
    }

    @Test
    void hasNoTestForASingleBandTarget() {
        GradeFigures g = GradeDistribution.of(values(0, 3), ABCD, target(0, 1));
        assertThat(g.emdToTarget()).isCloseTo(0, within(1e-12));
        assertThat(g.chiSquare()).isNull();
        assertThat(g.chiSquareDf()).isNull();
    }

    @Test
    void sumsTheDefaultPyramidToOne() {
        // Outdoor Insider (Fall 2015, p. 15): 1+2+3+4+5+6+5+4+3+1+1 = 35.
        assertThat(TargetPyramid.defaultBoulder().values().stream()
                        .mapToDouble(Double::doubleValue)
                        .sum())
                .isCloseTo(1.0, within(1e-12));
        assertThat(BandSet.defaults(Discipline.BOULDER).labels())
                .containsAll(TargetPyramid.defaultBoulder().keySet());
    }

    /** The Wasserstein distance is a metric: the triangle inequality holds for random distributions. */
    @ParameterizedTest(name = "seed {0}")
    @MethodSource("seeds")
    void obeysTheTriangleInequality(long seed) {
        Random r = new Random(seed);
        int[] a = {r.nextInt(9) + 1, r.nextInt(9), r.nextInt(9), r.nextInt(9)};
        double[] b = {r.nextDouble() + 0.01, r.nextDouble(), r.nextDouble(), r.nextDouble()};
        double[] c = {r.nextDouble() + 0.01, r.nextDouble(), r.nextDouble(), r.nextDouble()};
        double ab = GradeDistribution.of(values(a), ABCD, target(b)).emdToTarget();
        double ac = GradeDistribution.of(values(a), ABCD, target(c)).emdToTarget();
        double cum = 0;
        double cumC = 0;
        double sb = java.util.Arrays.stream(b).sum();
        double sc = java.util.Arrays.stream(c).sum();
        double bcDistance = 0;
        for (int i = 0; i < 4; i++) {
            cum += b[i] / sb;
            cumC += c[i] / sc;
            bcDistance += Math.abs(cum - cumC);
        }
        assertThat(ab).isLessThanOrEqualTo(ac + bcDistance + 1e-12);
    }

    /**
     * Seeded random histograms against random targets over six unit-spaced bands; expected values from SciPy 1.17.1
     * ({@code wasserstein_distance} with band indices as values and counts as weights, {@code chisquare} with
     * N × target shares): src/test/resources/.../grades/make-scipy-cases.py, run as written in its first line.
     * Tolerance 1e-12 relative for the statistic, 1e-9 absolute for p.
     */
    @ParameterizedTest(name = "case {index}")
    @CsvFileSource(resources = "scipy-cases.csv", useHeadersInDisplayName = true)
    void agreesWithScipy(String observed, String target, double emd, double chiSquare, double p) {
        int[] obs = java.util.Arrays.stream(observed.split(";"))
                .mapToInt(Integer::parseInt)
                .toArray();
        String[] t = target.split(";");
        Map<String, Double> shares = new LinkedHashMap<>();
        for (int i = 0; i < t.length; i++) {
            shares.put(SIX.labels().get(i), Double.parseDouble(t[i]));
        }
        GradeFigures g = GradeDistribution.of(repeated(1, obs), SIX, shares);
        assertThat(g.emdToTarget()).isCloseTo(emd, within(1e-12));
        assertThat(g.chiSquare()).isCloseTo(chiSquare, org.assertj.core.data.Percentage.withPercentage(1e-10));
        assertThat(g.chiSquareP()).isCloseTo(p, within(1e-9));
        assertThat(g.chiSquareDf()).isEqualTo(5);
    }

    static Stream<Long> seeds() {
        return LongStream.rangeClosed(1, 30).boxed();
    }
}
