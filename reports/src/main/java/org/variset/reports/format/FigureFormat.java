package org.variset.reports.format;

import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.LinkedHashMap;
import java.util.Map;

/**
 * Rounds figures for people: half-up, with the decimals of the figure's key (the last part of its JSON path, such
 * as {@code sector_entropy}). An undefined figure reads as an en dash.
 */
public final class FigureFormat {
    /** How an undefined (null) figure reads. */
    public static final String NONE = "–";

    private static final Map<String, Integer> DECIMALS = new LinkedHashMap<>();

    static {
        for (String k : new String[] {"score", "mean_direction_deg", "circular_sd_deg", "n", "richness"}) {
            DECIMALS.put(k, 0);
        }
        for (String k : new String[] {"hill_n1", "hill_n2", "path_length", "hull_perimeter", "change_score"}) {
            DECIMALS.put(k, 1);
        }
        for (String k :
                new String[] {"rayleigh_p", "chi_square_p", "gie", "gie_mean", "gie_min", "gie_max", "jaccard"}) {
            DECIMALS.put(k, 3);
        }
    }

    private FigureFormat() {}

    /** The decimals a key is shown with: those listed above, else 2. */
    public static int decimals(String key) {
        String last = key.substring(key.lastIndexOf('.') + 1);
        return DECIMALS.getOrDefault(last, 2);
    }

    /**
     * The figure rounded half-up to its key's decimals, or {@link #NONE}; a p-value (key ending {@code _p}) below
     * 0.001 reads {@code < 0.001} rather than a rounded zero.
     */
    public static String of(String key, Double value) {
        if (value == null) {
            return NONE;
        }
        if (key.endsWith("_p") && value < 0.001) {
            return "< 0.001";
        }
        return round(value, decimals(key));
    }

    /** A value rounded half-up to a number of decimals. */
    public static String round(double value, int decimals) {
        if (Double.isNaN(value) || Double.isInfinite(value)) {
            throw new IllegalArgumentException("not a finite figure: " + value);
        }
        return new BigDecimal(Double.toString(value))
                .setScale(decimals, RoundingMode.HALF_UP)
                .toPlainString();
    }

    /** A share in [0, 1] as a whole percentage ({@code 62%}), or {@link #NONE}. */
    public static String percent(Double share) {
        return share == null ? NONE : round(100 * share, 0) + "%";
    }

    /**
     * A signed change ({@code +0.12}, {@code -3}) between the two figures as shown (each rounded first, so that the
     * change agrees with the figures beside it), or {@link #NONE} when either side is undefined.
     */
    public static String change(String key, Double now, Double before) {
        if (now == null || before == null) {
            return NONE;
        }
        int d = decimals(key);
        BigDecimal diff = new BigDecimal(round(now, d)).subtract(new BigDecimal(round(before, d)));
        return (diff.signum() < 0 ? "" : "+") + diff.toPlainString();
    }
}
