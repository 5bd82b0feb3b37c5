package org.variset.reports.format;

import java.math.BigDecimal;
import java.math.RoundingMode;

/**
 * Rounds numbers for people: half-up. A figure's own decimals and unit are in the catalogue
 * ({@link org.variset.reports.catalogue.Figure#text}); this is the arithmetic beneath. An undefined figure reads as an
 * en dash.
 */
public final class FigureFormat {
    /** How an undefined (null) figure reads. */
    public static final String NONE = "–";

    private FigureFormat() {}

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

    /** A count and its noun, singular for one: {@code 1 route}, {@code 3 routes}. */
    public static String count(long n, String noun) {
        return count(n, noun, noun + "s");
    }

    /** A count and its noun, with the plural given: {@code 1 hold without a direction}, {@code 2 holds ...}. */
    public static String count(long n, String singular, String plural) {
        return n + " " + (n == 1 ? singular : plural);
    }
}
