package org.variset.reports.scoring.variety;

import java.util.LinkedHashMap;
import java.util.Map;

/**
 * Diversity of counts over categories (docs/spec/metrics.md section 2). For counts n<sub>i</sub>, N = Σ n<sub>i</sub>,
 * p<sub>i</sub> = n<sub>i</sub> / N, natural logarithms:
 * richness S = #{i : n<sub>i</sub> &gt; 0}; Shannon H' = −Σ p<sub>i</sub> ln p<sub>i</sub>; Pielou J' = H' / ln S;
 * Gini-Simpson 1 − Σ p<sub>i</sub>² (the with-replacement form); Hill N1 = exp(H'), N2 = 1 / Σ p<sub>i</sub>², the
 * effective numbers of categories; coverage = N1 / min(K, N) for a vocabulary of K terms.
 *
 * <p>Edge cases: N = 0 leaves every figure but richness null; Pielou is null for S &lt; 2; coverage is null when
 * the vocabulary size is unknown. Always N2 ≤ N1 ≤ S.
 *
 * <p>References:
 * <ul>
 * <li>Shannon C. E. (1948), "A mathematical theory of communication", Bell System Technical Journal 27:379-423,
 * DOI 10.1002/j.1538-7305.1948.tb01338.x.</li>
 * <li>Pielou E. C. (1966), "The measurement of diversity in different types of biological collections", Journal of
 * Theoretical Biology 13:131-144, DOI 10.1016/0022-5193(66)90013-0.</li>
 * <li>Simpson E. H. (1949), "Measurement of diversity", Nature 163:688, DOI 10.1038/163688a0.</li>
 * <li>Hill M. O. (1973), "Diversity and evenness: a unifying notation and its consequences", Ecology 54:427-432,
 * DOI 10.2307/1934352.</li>
 * <li>Jost L. (2006), "Entropy and diversity", Oikos 113:363-375, DOI 10.1111/j.2006.0030-1299.14714.x.</li>
 * </ul>
 */
public final class CategoryVariety {
    private CategoryVariety() {}

    /**
     * The variety of counts.
     *
     * @param counts count per category (zero counts allowed)
     * @param missing observations without a value
     * @param vocabularySize K, the number of terms the gym could offer in this field, or null when it has none
     */
    public static VarietyFigures of(Map<String, Long> counts, long missing, Integer vocabularySize) {
        long n = 0;
        int s = 0;
        for (long c : counts.values()) {
            if (c < 0) {
                throw new IllegalArgumentException("a count is negative: " + c);
            }
            n += c;
            s += c > 0 ? 1 : 0;
        }
        Map<String, String> why = new LinkedHashMap<>();
        if (n == 0) {
            for (String key : new String[] {"shannon", "pielou", "gini_simpson", "hill_n1", "hill_n2", "coverage"}) {
                why.put(key, "nothing to count");
            }
            return new VarietyFigures(0, missing, 0, null, null, null, null, null, null, Map.copyOf(counts), why);
        }
        double h = 0;
        double sumSq = 0;
        for (long c : counts.values().stream().sorted().toList()) {
            if (c > 0) {
                double p = c / (double) n;
                h -= p * Math.log(p);
                sumSq += p * p;
            }
        }
        Double pielou = null;
        if (s < 2) {
            why.put("pielou", "evenness needs at least two categories");
        } else {
            pielou = h / Math.log(s);
        }
        double n1 = Math.exp(h);
        Double coverage = null;
        if (vocabularySize == null || vocabularySize < 1) {
            why.put("coverage", "the field has no vocabulary to cover");
        } else {
            coverage = n1 / Math.min(vocabularySize, n);
        }
        return new VarietyFigures(
                n, missing, s, h, pielou, 1 - sumSq, n1, 1 / sumSq, coverage, new LinkedHashMap<>(counts), why);
    }
}
