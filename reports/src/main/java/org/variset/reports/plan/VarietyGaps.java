package org.variset.reports.plan;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;

/**
 * Categories that have fallen behind: those whose share now is below a baseline share by at least a margin, in
 * percentage points. The planner's baseline is the median share over the last twelve months' resets of walls like the
 * one being reset. A heuristic of ours for "what the next reset could bring back".
 */
public final class VarietyGaps {
    private VarietyGaps() {}

    /**
     * One category behind.
     *
     * @param field what kind ({@code grip}, {@code holds}, {@code moves}, {@code styles})
     * @param category the category ({@code down}, {@code sloper}, {@code heel hook})
     * @param standingShare its share now, in the standing set
     * @param baselineShare its baseline share
     */
    public record Gap(String field, String category, double standingShare, double baselineShare) {
        /** How far behind, in share points. */
        public double shortfall() {
            return baselineShare - standingShare;
        }
    }

    /**
     * The categories of one field whose standing share is at least {@code margin} below their share over a period,
     * most behind first.
     *
     * @param standing counts in the standing set
     * @param period counts over the period
     */
    public static List<Gap> of(String field, Map<String, Long> standing, Map<String, Long> period, double margin) {
        return ofShares(field, shares(standing), shares(period), margin);
    }

    /**
     * The categories whose share now is at least {@code margin} below their baseline share, most behind first.
     *
     * @param now shares now, per category
     * @param baseline baseline shares, per category (the median over resets: {@link #medianShares})
     */
    public static List<Gap> ofShares(
            String field, Map<String, Double> now, Map<String, Double> baseline, double margin) {
        List<Gap> out = new ArrayList<>();
        for (Map.Entry<String, Double> e : baseline.entrySet()) {
            double n = now.getOrDefault(e.getKey(), 0.0);
            if (e.getValue() > 0 && e.getValue() - n >= margin - 1e-12) {
                out.add(new Gap(field, e.getKey(), n, e.getValue()));
            }
        }
        out.sort(Comparator.comparingDouble(Gap::shortfall).reversed().thenComparing(Gap::category));
        return out;
    }

    /** Each category's share of a set of counts (empty counts: no shares). */
    public static Map<String, Double> shares(Map<String, Long> counts) {
        long n = counts.values().stream().mapToLong(Long::longValue).sum();
        Map<String, Double> out = new LinkedHashMap<>();
        if (n > 0) {
            counts.forEach((k, v) -> out.put(k, v / (double) n));
        }
        return out;
    }

    /**
     * The median over several sets (resets) of each category's share, a set without the category counting 0: one
     * reset unlike the others (all grips facing up, say) moves a median little, where it moves a pooled share a lot.
     * Sets with no counts are left out. Median of an even number of values: the mean of the middle two.
     */
    public static Map<String, Double> medianShares(List<Map<String, Long>> sets) {
        List<Map<String, Double>> shares =
                sets.stream().map(VarietyGaps::shares).filter(m -> !m.isEmpty()).toList();
        Set<String> categories = new TreeSet<>();
        shares.forEach(m -> categories.addAll(m.keySet()));
        Map<String, Double> out = new LinkedHashMap<>();
        for (String c : categories) {
            double[] v = shares.stream()
                    .mapToDouble(m -> m.getOrDefault(c, 0.0))
                    .sorted()
                    .toArray();
            int n = v.length;
            out.put(c, n % 2 == 1 ? v[n / 2] : (v[n / 2 - 1] + v[n / 2]) / 2);
        }
        return out;
    }
}
