package org.variset.reports.plan;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Map;

/**
 * Categories that have fallen behind: those whose share in the standing set is below their share over a longer
 * period (the gym's last twelve months) by at least a margin, in percentage points. A heuristic of ours for "what the
 * next reset could bring back".
 */
public final class VarietyGaps {
    private VarietyGaps() {}

    /**
     * One category behind.
     *
     * @param field what kind ({@code grip}, {@code holds}, {@code moves}, {@code styles})
     * @param category the category ({@code down}, {@code sloper}, {@code heel hook})
     * @param standingShare its share in the standing set
     * @param yearShare its share over the longer period
     */
    public record Gap(String field, String category, double standingShare, double yearShare) {
        /** How far behind, in share points. */
        public double shortfall() {
            return yearShare - standingShare;
        }
    }

    /**
     * The categories of one field whose standing share is at least {@code margin} below their period share, most
     * behind first.
     *
     * @param standing counts in the standing set
     * @param period counts over the period
     */
    public static List<Gap> of(String field, Map<String, Long> standing, Map<String, Long> period, double margin) {
        long sn = standing.values().stream().mapToLong(Long::longValue).sum();
        long pn = period.values().stream().mapToLong(Long::longValue).sum();
        List<Gap> out = new ArrayList<>();
        if (pn == 0) {
            return out;
        }
        for (Map.Entry<String, Long> e : period.entrySet()) {
            double year = e.getValue() / (double) pn;
            double now = sn == 0 ? 0 : standing.getOrDefault(e.getKey(), 0L) / (double) sn;
            if (year - now >= margin - 1e-12) {
                out.add(new Gap(field, e.getKey(), now, year));
            }
        }
        out.sort(Comparator.comparingDouble(Gap::shortfall).reversed().thenComparing(Gap::category));
        return out;
    }
}
