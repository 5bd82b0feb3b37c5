package org.variset.reports.scoring.score;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The composite score (docs/spec/metrics.md section 7): 100 × the weighted mean of the parts that are not null, the weights
 * rescaled over those parts; null with fewer than three parts. The weights are the gym's settings (their defaults,
 * from the spec, are {@code GymSettings.DEFAULT_SCORE_WEIGHTS}). A heuristic of ours, always shown beside its parts.
 *
 * @param score the score, or null
 * @param parts each part's value in [0, 1] (null where undefined)
 * @param weightsUsed the rescaled weights of the parts used
 * @param dropped the parts left out because they were null
 */
public record CompositeScore(
        Double score, Map<String, Double> parts, Map<String, Double> weightsUsed, List<String> dropped) {

    /** The grades part from the standing set's distance to target: exp(−emd), null when the distance is. */
    public static Double gradesPart(Double emdToTarget) {
        return gradesPart(emdToTarget, 0);
    }

    /**
     * The grades part: exp(−emd) × (1 − m), where m is the target's share in runs of two or more adjacent bands the
     * set has no route in. The distance alone can improve while a whole range empties (it measures how far routes are
     * from where they should be, and a range with none moves little mass); the factor makes such a gap cost what the
     * target gives it. A heuristic of ours (docs/spec/metrics.md section 7).
     *
     * @param missingShare m, in [0, 1]
     */
    public static Double gradesPart(Double emdToTarget, double missingShare) {
        if (missingShare < 0 || missingShare > 1 + 1e-12) {
            throw new IllegalArgumentException("the missing share " + missingShare + " is outside [0, 1]");
        }
        return emdToTarget == null ? null : Math.exp(-emdToTarget) * (1 - Math.min(1, missingShare));
    }

    /**
     * The score of parts under weights.
     *
     * @throws IllegalArgumentException for a negative weight or a part outside [0, 1]
     */
    public static CompositeScore of(Map<String, Double> parts, Map<String, Double> weights) {
        Map<String, Double> used = new LinkedHashMap<>();
        List<String> dropped = new ArrayList<>();
        double total = 0;
        for (Map.Entry<String, Double> w : weights.entrySet()) {
            if (w.getValue() < 0) {
                throw new IllegalArgumentException("weight of " + w.getKey() + " is negative");
            }
            Double v = parts.get(w.getKey());
            if (v == null) {
                dropped.add(w.getKey());
            } else if (v < 0 || v > 1 + 1e-12) {
                throw new IllegalArgumentException("part " + w.getKey() + " = " + v + " is outside [0, 1]");
            } else {
                used.put(w.getKey(), w.getValue());
                total += w.getValue();
            }
        }
        if (used.size() < 3 || total <= 0) {
            return new CompositeScore(null, new LinkedHashMap<>(parts), Map.of(), dropped);
        }
        double s = 0;
        Map<String, Double> rescaled = new LinkedHashMap<>();
        for (Map.Entry<String, Double> u : used.entrySet()) {
            double w = u.getValue() / total;
            rescaled.put(u.getKey(), w);
            s += w * parts.get(u.getKey());
        }
        return new CompositeScore(100 * s, new LinkedHashMap<>(parts), rescaled, dropped);
    }
}
