package org.variset.reports.catalogue;

import java.math.BigDecimal;
import java.util.Objects;
import org.variset.reports.format.FigureFormat;

/**
 * One figure of the catalogue.
 *
 * @param key its JSON path in an audit ({@code grip.sector_entropy}); grade figures sit under their discipline in
 *     the JSON ({@code grades.boulder.emd_to_target}) and are keyed here without it
 * @param label what people read beside it ({@code grip direction spread (sector entropy)})
 * @param shortLabel the same in at most ten characters, for narrow table columns
 * @param unit what its number measures, which decides how it is shown
 * @param decimals how many decimals people see (half-up); shares are shown as whole percentages
 * @param better which direction is better for variety, or {@link Better#NEITHER}
 * @param source the published method or the section of docs/spec/metrics.md it follows, or "heuristic of ours"
 */
public record Figure(
        String key, String label, String shortLabel, Unit unit, int decimals, Better better, String source) {

    /** What a figure's number measures. */
    public enum Unit {
        /** A plain number: an index, an entropy, a distance without a unit. */
        NUMBER,
        /** A count of things. */
        COUNT,
        /** A share in [0, 1], shown as a percentage. */
        SHARE,
        /** A probability (a p-value): very small ones read "< 0.001". */
        PROBABILITY,
        /** Degrees. */
        DEGREES,
        /** Metres. */
        METRES,
        /** Grade bands. */
        BANDS,
        /** Days. */
        DAYS,
        /** Points of 100 (the score). */
        POINTS
    }

    /** Which direction of a change is better for variety. */
    public enum Better {
        /** More is better (more spread, more coverage, more novelty). */
        HIGHER,
        /** Less is better (closer to the target, less reuse). */
        LOWER,
        /** Neither: a figure to read, not to push (a mean direction, a p-value, a count). */
        NEITHER;

        /** "better", "worse" or "" for a change from {@code before} to {@code now} as shown (rounded). */
        public String judge(BigDecimal change) {
            if (this == NEITHER || change.signum() == 0) {
                return "";
            }
            return (change.signum() > 0) == (this == HIGHER) ? "better" : "worse";
        }
    }

    /** Checks the fields. */
    public Figure {
        Objects.requireNonNull(key, "key");
        Objects.requireNonNull(label, "label");
        Objects.requireNonNull(unit, "unit");
        Objects.requireNonNull(better, "better");
        Objects.requireNonNull(source, "source");
        if (shortLabel.length() > 10) {
            throw new IllegalArgumentException("short label of " + key + " is longer than ten characters");
        }
    }

    /** The last segment of the key, as the JSON writes it inside its block ({@code sector_entropy}). */
    public String leaf() {
        return key.substring(key.lastIndexOf('.') + 1);
    }

    /**
     * The figure for people: rounded half-up to its decimals, a share as a whole percentage, a p-value below 0.001
     * as {@code < 0.001}; {@link FigureFormat#NONE} when undefined.
     */
    public String text(Double value) {
        if (value == null) {
            return FigureFormat.NONE;
        }
        return switch (unit) {
            case SHARE -> FigureFormat.percent(value);
            case PROBABILITY -> value < 0.001 ? "< 0.001" : FigureFormat.round(value, decimals);
            default -> FigureFormat.round(value, decimals);
        };
    }

    /**
     * The change between two values as shown: each rounded first, so that the change agrees with the figures beside
     * it; shares in percentage points ({@code +3 pts}); {@link FigureFormat#NONE} when either is undefined.
     */
    public String change(Double now, Double before) {
        BigDecimal d = difference(now, before);
        if (d == null) {
            return FigureFormat.NONE;
        }
        return (d.signum() < 0 ? "" : "+") + d.toPlainString() + (unit == Unit.SHARE ? " pts" : "");
    }

    /** The change as shown (shares in points), or null when either value is undefined. */
    public BigDecimal difference(Double now, Double before) {
        if (now == null || before == null) {
            return null;
        }
        boolean share = unit == Unit.SHARE;
        int d = share ? 0 : decimals;
        double scale = share ? 100 : 1;
        return new BigDecimal(FigureFormat.round(scale * now, d))
                .subtract(new BigDecimal(FigureFormat.round(scale * before, d)));
    }
}
