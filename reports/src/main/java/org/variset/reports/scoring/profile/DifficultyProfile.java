package org.variset.reports.scoring.profile;

import java.util.EnumMap;
import java.util.List;
import java.util.Map;

/**
 * Classifies routes by their move difficulties d<sub>1</sub>..d<sub>m</sub> (docs/spec/metrics.md section 4): with m ≥ 3,
 * mean μ, population standard deviation σ (dividing by m), CV = σ / μ; crux moves are those with d ≥ μ + σ. The
 * class is {@code steady} when CV &lt; 0.15, else {@code sustained}, {@code single_crux} or {@code multi_crux} by
 * the number of crux moves; m &lt; 3 is {@code unclassified}. The split entropy is the Shannon entropy of the four
 * class shares over the classified routes, divided by ln 4 (Shannon 1948), null when none is classified.
 *
 * <p>The thresholds (CV 0.15, one standard deviation for a crux) are the spec's heuristics.
 */
public final class DifficultyProfile {
    private static final double STEADY_CV = 0.15;

    private DifficultyProfile() {}

    /** The class of one route's move difficulties. */
    public static ProfileClass classify(List<Integer> d) {
        int m = d.size();
        if (m < 3) {
            return ProfileClass.UNCLASSIFIED;
        }
        double mean = d.stream().mapToDouble(Integer::doubleValue).sum() / m;
        double ss = d.stream().mapToDouble(x -> (x - mean) * (x - mean)).sum();
        double sd = Math.sqrt(ss / m);
        if (sd / mean < STEADY_CV) {
            return ProfileClass.STEADY;
        }
        long cruxes = d.stream().filter(x -> x >= mean + sd).count();
        return cruxes == 0 ? ProfileClass.SUSTAINED : cruxes == 1 ? ProfileClass.SINGLE_CRUX : ProfileClass.MULTI_CRUX;
    }

    /** Counts per class, every class present (zeros included), in the spec's order. */
    public static Map<ProfileClass, Long> counts(List<List<Integer>> routes) {
        Map<ProfileClass, Long> out = new EnumMap<>(ProfileClass.class);
        for (ProfileClass c : ProfileClass.values()) {
            out.put(c, 0L);
        }
        routes.forEach(r -> out.merge(classify(r), 1L, Long::sum));
        return out;
    }

    /** Entropy of the four class shares over ln 4, or null when no route is classified. */
    public static Double splitEntropy(Map<ProfileClass, Long> counts) {
        long n = counts.entrySet().stream()
                .filter(e -> e.getKey() != ProfileClass.UNCLASSIFIED)
                .mapToLong(Map.Entry::getValue)
                .sum();
        if (n == 0) {
            return null;
        }
        double h = 0;
        for (ProfileClass c : List.of(
                ProfileClass.STEADY, ProfileClass.SUSTAINED, ProfileClass.SINGLE_CRUX, ProfileClass.MULTI_CRUX)) {
            long k = counts.getOrDefault(c, 0L);
            if (k > 0) {
                double p = k / (double) n;
                h -= p * Math.log(p);
            }
        }
        return h / Math.log(4);
    }
}
