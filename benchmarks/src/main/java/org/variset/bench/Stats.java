package org.variset.bench;

import java.util.Arrays;
import java.util.List;

/** Order statistics of repeated measurements. */
public final class Stats {
    private Stats() {}

    /** The median (the mean of the two middle values for an even count). */
    public static double median(List<Double> xs) {
        return percentile(xs, 50);
    }

    /**
     * A percentile by linear interpolation between order statistics: definition 7 of Hyndman and Fan (1996), "Sample
     * quantiles in statistical packages", The American Statistician 50(4), the default of R's {@code quantile} and of
     * NumPy's {@code percentile}.
     *
     * @param p the percentile, 0 to 100
     */
    public static double percentile(List<Double> xs, double p) {
        if (xs.isEmpty()) {
            throw new IllegalArgumentException("no measurements");
        }
        if (p < 0 || p > 100) {
            throw new IllegalArgumentException("a percentile runs from 0 to 100, not " + p);
        }
        double[] s = xs.stream().mapToDouble(Double::doubleValue).toArray();
        Arrays.sort(s);
        double h = (s.length - 1) * p / 100.0;
        int lo = (int) Math.floor(h);
        int hi = Math.min(lo + 1, s.length - 1);
        return s[lo] + (h - lo) * (s[hi] - s[lo]);
    }
}
