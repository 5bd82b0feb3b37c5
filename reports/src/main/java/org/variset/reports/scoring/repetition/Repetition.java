package org.variset.reports.scoring.repetition;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;

/**
 * Near-repeats, novelty and hold reuse of a reset (docs/spec/metrics.md section 5). Every pair is computed exactly: one reset
 * against one gym's look-back window is small (tens of routes against a few thousand).
 *
 * <p>A pair at or above the threshold is a near-repeat only when the evidence a setter weighs makes it one
 * ({@link RepeatEvidence}: the same hold shapes in the same layout, else the same grade band and run of moves); the
 * others are set aside as look-alikes. Novelty stays the spec's, from the Jaccard index alone.
 *
 * <p>novelty = 1 − mean over the reset's comparable routes of their highest Jaccard index against the window; 1
 * when the window is empty; null when no reset route is comparable. A comparable route with no comparable route in
 * the window counts as 0 similarity. Routes are compared only within their group (one discipline). hold_reuse_rate = placements whose (hold_ref, sector) was also on the wall
 * in its previous three resets, over all the reset's placements.
 */
public final class Repetition {
    private Repetition() {}

    /**
     * The repetition figures.
     *
     * @param reset the audited reset's routes
     * @param window the routes of the look-back window (same gym and discipline, not in the reset)
     * @param threshold the near-repeat threshold
     */
    public static RepetitionFigures of(List<RouteFeatures> reset, List<RouteFeatures> window, BigDecimal threshold) {
        List<RepetitionFigures.Pair> near = new ArrayList<>();
        List<RepetitionFigures.Pair> internal = new ArrayList<>();
        List<RepetitionFigures.Pair> setAside = new ArrayList<>();
        List<String> thin = new ArrayList<>();
        double sumBest = 0;
        int comparable = 0;
        for (int i = 0; i < reset.size(); i++) {
            RouteFeatures r = reset.get(i);
            if (!r.comparable()) {
                thin.add(r.id());
                continue;
            }
            comparable++;
            double best = 0;
            for (RouteFeatures w : window) {
                Similarity s = Similarity.of(r, w);
                if (s != null) {
                    best = Math.max(best, s.jaccard());
                    if (s.atLeast(threshold)) {
                        RepetitionFigures.Pair p = pair(r, w, s);
                        (p.evidence().isRepeat() ? near : setAside).add(p);
                    }
                }
            }
            sumBest += best;
            for (int j = i + 1; j < reset.size(); j++) {
                Similarity s = Similarity.of(r, reset.get(j));
                if (s != null && s.atLeast(threshold)) {
                    RepetitionFigures.Pair p = pair(r, reset.get(j), s);
                    (p.evidence().isRepeat() ? internal : setAside).add(p);
                }
            }
        }
        Double novelty = comparable == 0 ? null : window.isEmpty() ? 1.0 : 1.0 - sumBest / comparable;
        return new RepetitionFigures(near, internal, setAside, novelty, thin);
    }

    private static RepetitionFigures.Pair pair(RouteFeatures a, RouteFeatures b, Similarity s) {
        return new RepetitionFigures.Pair(a.id(), b.id(), s, RepeatEvidence.of(a.evidence(), b.evidence()));
    }

    /**
     * The hold reuse rate.
     *
     * @param placements for each placement of the reset, its (hold_ref, sector) keys ({@code J12@0},
     *     {@code J12@none}); empty for a placement without hold_ref
     * @param previous the (hold_ref, sector) keys of the wall's previous three resets
     * @return the share, or null when the reset has no placement
     */
    public static Double holdReuseRate(List<Set<String>> placements, Set<String> previous) {
        if (placements.isEmpty()) {
            return null;
        }
        long reused = placements.stream()
                .filter(p -> p.stream().anyMatch(previous::contains))
                .count();
        return reused / (double) placements.size();
    }
}
