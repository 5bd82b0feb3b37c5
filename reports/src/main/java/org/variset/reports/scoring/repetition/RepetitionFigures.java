package org.variset.reports.scoring.repetition;

import java.util.List;

/**
 * Repetition figures of one reset (docs/spec/metrics.md section 5; JSON keys in brackets).
 *
 * @param nearRepeats pairs of a reset route and an earlier route with Jaccard at or above the threshold that the
 *     evidence makes repeats ({@link RepeatEvidence}) [{@code near_repeats}]
 * @param internalRepeats such pairs inside the reset itself [{@code internal_repeats}]
 * @param setAside pairs at or above the threshold that the evidence does not make repeats (look-alikes)
 *     [{@code similar_not_repeats}]
 * @param novelty 1 − mean of each comparable route's highest Jaccard against the window [{@code novelty}]
 * @param notEnoughDetail reset routes with too little detail to compare [{@code not_enough_detail}]
 */
public record RepetitionFigures(
        List<Pair> nearRepeats,
        List<Pair> internalRepeats,
        List<Pair> setAside,
        Double novelty,
        List<String> notEnoughDetail) {

    /**
     * A near-repeat.
     *
     * @param route the audited route
     * @param other the route it repeats
     * @param similarity the exact similarity, with the shared features
     * @param evidence what says whether it is a repeat
     */
    public record Pair(String route, String other, Similarity similarity, RepeatEvidence evidence) {}
}
