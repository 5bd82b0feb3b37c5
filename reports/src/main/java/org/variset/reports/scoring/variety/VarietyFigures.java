package org.variset.reports.scoring.variety;

import java.util.Map;

/**
 * The variety figures of one category field (docs/spec/metrics.md section 2; JSON keys in brackets). Null where undefined,
 * with the reason in {@link #undefined()}.
 *
 * @param n observations N [{@code n}]
 * @param missing observations without a value, left out [{@code missing}]
 * @param richness categories with a count above zero, S [{@code richness}]
 * @param shannon H' = −Σ p ln p [{@code shannon}]
 * @param pielou J' = H' / ln S [{@code pielou}]
 * @param giniSimpson 1 − Σ p² [{@code gini_simpson}]
 * @param hillN1 exp(H') [{@code hill_n1}]
 * @param hillN2 1 / Σ p² [{@code hill_n2}]
 * @param coverage hill_n1 / min(K, N) [{@code coverage}]
 * @param counts the counts per category
 * @param undefined for each null figure, its key and why
 */
public record VarietyFigures(
        long n,
        long missing,
        int richness,
        Double shannon,
        Double pielou,
        Double giniSimpson,
        Double hillN1,
        Double hillN2,
        Double coverage,
        Map<String, Long> counts,
        Map<String, String> undefined) {}
