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
}
