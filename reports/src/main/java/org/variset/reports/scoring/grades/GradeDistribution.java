package org.variset.reports.scoring.grades;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.apache.commons.statistics.distribution.ChiSquaredDistribution;
import org.variset.archive.grade.Band;
import org.variset.archive.grade.BandSet;

/**
 * Grades of one discipline against the gym's target (docs/spec/metrics.md section 3).
 *
 * <p>Each IRCRA value falls in one band. The Wasserstein-1 distance between the observed and target distributions
 * over the target's bands, in band order with unit spacing, is Σ<sub>k</sub> |F<sub>obs</sub>(k) −
 * F<sub>target</sub>(k)| over the cumulative shares; routes in bands outside the target are counted and left out.
 * Pearson's chi-square compares the N routes in bands with a target share above zero with N × share:
 * χ² = Σ (O − E)² / E, df = K − 1, p from the chi-squared distribution of Apache Commons Statistics. Cochran's rule
 * marks the test unreliable when any expected count is below 1 or more than 20% are below 5.
 *
 * <p>Edge cases: no target gives a histogram and nothing else; no route within the target leaves the distance and
 * the test null; a single-band target has df = 0 and no test.
 *
 * <p>References:
 * <ul>
 * <li>Villani C. (2009), Optimal Transport: Old and New, Springer, DOI 10.1007/978-3-540-71050-9 (the
 * one-dimensional Wasserstein-1 distance as the area between the distribution functions).</li>
 * <li>Pearson K. (1900), "On the criterion that a given system of deviations ...", Philosophical Magazine 50:157-175,
 * DOI 10.1080/14786440009463897.</li>
 * <li>Cochran W. G. (1954), "Some methods for strengthening the common χ² tests", Biometrics 10:417-451,
 * DOI 10.2307/3001616.</li>
 * </ul>
 */
public final class GradeDistribution {
    private GradeDistribution() {}

    /**
     * The grade figures.
     *
     * @param ircra the routes' values on the IRCRA axis
     * @param bands the gym's bands for the discipline
     * @param target shares per band label (any positive scale; normalised here), or null when the gym has none
     */
    public static GradeFigures of(double[] ircra, BandSet bands, Map<String, Double> target) {
        Map<String, Long> histogram = new LinkedHashMap<>();
        bands.labels().forEach(l -> histogram.put(l, 0L));
        for (double v : ircra) {
            bands.bandOf(v).map(Band::label).ifPresent(l -> histogram.merge(l, 1L, Long::sum));
        }
        Map<String, String> why = new LinkedHashMap<>();
        if (target == null || target.isEmpty()) {
            String reason = "the gym has set no target for this discipline (see the settings command)";
            for (String k : new String[] {"emd_to_target", "chi_square", "chi_square_df", "chi_square_p"}) {
                why.put(k, reason);
            }
            return new GradeFigures(histogram, null, 0, null, null, null, null, null, List.of(), why);
        }
        List<String> order = bands.labels().stream().filter(target::containsKey).toList();
        double total = order.stream().mapToDouble(target::get).sum();
        long inside = order.stream().mapToLong(histogram::get).sum();
        long outside = ircra.length - inside;
        List<String> gaps = order.stream()
                .filter(l -> target.get(l) > 0 && histogram.get(l) == 0)
                .toList();
        Map<String, Double> shares = new LinkedHashMap<>();
        order.forEach(l -> shares.put(l, target.get(l) / total));
        if (inside == 0) {
            for (String k : new String[] {"emd_to_target", "chi_square", "chi_square_df", "chi_square_p"}) {
                why.put(k, "no route in the target's bands");
            }
            return new GradeFigures(histogram, shares, outside, null, null, null, null, null, gaps, why);
        }
        double emd = 0;
        double fObs = 0;
        double fTarget = 0;
        for (String l : order) {
            fObs += histogram.get(l) / (double) inside;
            fTarget += shares.get(l);
            emd += Math.abs(fObs - fTarget);
        }
        return chiSquare(histogram, shares, outside, emd, gaps, why);
    }

    private static GradeFigures chiSquare(
            Map<String, Long> histogram,
            Map<String, Double> shares,
            long outside,
            double emd,
            List<String> gaps,
            Map<String, String> why) {
        List<String> positive = new ArrayList<>(
                shares.keySet().stream().filter(l -> shares.get(l) > 0).toList());
        long n = positive.stream().mapToLong(histogram::get).sum();
        int df = positive.size() - 1;
        if (df < 1 || n == 0) {
            String reason = df < 1 ? "the target has a single band" : "no route in bands the target aims at";
            why.put("chi_square", reason);
            why.put("chi_square_p", reason);
            return new GradeFigures(histogram, shares, outside, emd, null, df < 1 ? null : df, null, null, gaps, why);
        }
        double positiveTotal = positive.stream().mapToDouble(shares::get).sum();
        double chi = 0;
        int below5 = 0;
        boolean below1 = false;
        for (String l : positive) {
            double e = n * shares.get(l) / positiveTotal;
            double d = histogram.get(l) - e;
            chi += d * d / e;
            below5 += e < 5 ? 1 : 0;
            below1 |= e < 1;
        }
        double p = ChiSquaredDistribution.of(df).survivalProbability(chi);
        boolean reliable = !below1 && below5 <= 0.2 * positive.size();
        return new GradeFigures(histogram, shares, outside, emd, chi, df, p, reliable, gaps, why);
    }
}
