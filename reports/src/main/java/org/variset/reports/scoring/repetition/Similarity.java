package org.variset.reports.scoring.repetition;

import java.math.BigDecimal;
import java.util.Set;
import java.util.TreeSet;

/**
 * The Jaccard index of two routes' feature sets, |A ∩ B| / |A ∪ B|, kept as an exact fraction so that a threshold
 * such as 0.6 is compared without rounding. Null ("not enough detail") when either route has fewer than four hold
 * and move features.
 *
 * <p>Reference: Jaccard P. (1912), "The distribution of the flora in the alpine zone", New Phytologist
 * 11(2):37-50, DOI 10.1111/j.1469-8137.1912.tb05611.x.
 *
 * @param shared |A ∩ B|
 * @param union |A ∪ B|
 * @param sharedFeatures the shared features, sorted
 */
public record Similarity(int shared, int union, Set<String> sharedFeatures) {

    /** The similarity of two routes, or null when either has too little detail or they are of different groups. */
    public static Similarity of(RouteFeatures a, RouteFeatures b) {
        if (!a.comparable() || !b.comparable() || !a.group().equals(b.group())) {
            return null;
        }
        Set<String> both = new TreeSet<>(a.features());
        both.retainAll(b.features());
        int union = a.features().size() + b.features().size() - both.size();
        return new Similarity(both.size(), union, both);
    }

    /** The index as a double. */
    public double jaccard() {
        return union == 0 ? 0 : shared / (double) union;
    }

    /** True when shared / union ≥ threshold, in exact arithmetic. */
    public boolean atLeast(BigDecimal threshold) {
        return BigDecimal.valueOf(shared).compareTo(threshold.multiply(BigDecimal.valueOf(union))) >= 0;
    }
}
