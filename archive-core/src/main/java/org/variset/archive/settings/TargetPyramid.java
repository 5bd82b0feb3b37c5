package org.variset.archive.settings;

import java.util.LinkedHashMap;
import java.util.Map;

/**
 * The default boulder target: VB 1, V0 2, V1 3, V2 4, V3 5, V4 6, V5 5, V6 4, V7 3, V8 1, V9 1 (out of 35),
 * published as one gym's example in Outdoor Insider, Fall 2015, p. 15. Common practice, an example to replace
 * with the gym's own; rope routes have no default.
 */
public final class TargetPyramid {
    private TargetPyramid() {}

    private static final String[] BANDS = {"VB", "V0", "V1", "V2", "V3", "V4", "V5", "V6", "V7", "V8", "V9"};
    private static final int[] WEIGHTS = {1, 2, 3, 4, 5, 6, 5, 4, 3, 1, 1};

    /** The default boulder target as shares summing to 1, in band order. */
    public static Map<String, Double> defaultBoulder() {
        Map<String, Double> out = new LinkedHashMap<>();
        for (int i = 0; i < BANDS.length; i++) {
            out.put(BANDS[i], WEIGHTS[i] / 35.0);
        }
        return out;
    }

    /** The default boulder target as the published weights (out of 35), in band order. */
    public static Map<String, Double> weights() {
        Map<String, Double> out = new LinkedHashMap<>();
        for (int i = 0; i < BANDS.length; i++) {
            out.put(BANDS[i], (double) WEIGHTS[i]);
        }
        return out;
    }
}
