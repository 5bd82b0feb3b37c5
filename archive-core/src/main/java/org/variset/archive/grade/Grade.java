package org.variset.archive.grade;

import java.util.Objects;

/**
 * A grade as the setters wrote it, with its reading on the IRCRA axis.
 *
 * @param text the text exactly as written
 * @param scale the scale it was read in
 * @param canonical the canonical spelling ({@code V3/V4}, {@code 6a+}, {@code 5.10a/5.10b}, {@code 7+})
 * @param ircra the value on the IRCRA axis: the midpoint of the levels the grade spans, or the mean of the two
 *     grades of a slash grade
 * @param lowLevel the first level of the table the grade spans (used to convert)
 * @param highLevel the last level of the table the grade spans
 * @param modifier an unlisted {@code +}/{@code -} kept as a flag
 * @param beyondTable true when the grade lies above the table and its value was extended one level per step
 */
public record Grade(
        String text,
        GradeScale scale,
        String canonical,
        double ircra,
        int lowLevel,
        int highLevel,
        GradeModifier modifier,
        boolean beyondTable) {

    /** Checks the fields. */
    public Grade {
        Objects.requireNonNull(text, "text");
        Objects.requireNonNull(scale, "scale");
        Objects.requireNonNull(canonical, "canonical");
        Objects.requireNonNull(modifier, "modifier");
        if (lowLevel > highLevel) {
            throw new IllegalArgumentException("lowLevel > highLevel");
        }
    }

    /**
     * The lower edge, on the IRCRA axis, of the table rows the grade covers: a row {@code n} covers {@code n ± 0.5}, so
     * this is half a level below its first row; an older French letter grade, half a level from its neighbours, covers
     * a quarter of a level either side of its value (docs/spec/grades.md, "Grade ranges").
     */
    public double rowsLow() {
        return olderFrench() ? ircra - 0.25 : lowLevel - 0.5;
    }

    /** The upper edge of the rows the grade covers: as {@link #rowsLow}, above. */
    public double rowsHigh() {
        return olderFrench() ? ircra + 0.25 : highLevel + 0.5;
    }

    private boolean olderFrench() {
        return scale == GradeScale.FRENCH && GradeNotation.OLDER_FRENCH.containsKey(canonical);
    }

    /** The IRCRA value as people read it: {@code 17}, {@code 15.5}. */
    public String ircraText() {
        return ircra == Math.rint(ircra) ? String.valueOf((long) ircra) : String.valueOf(ircra);
    }

    /** The canonical grade with its scale, for people: {@code French 6a+}, {@code V4 (hard)}. */
    public String describe() {
        String flag = switch (modifier) {
            case HARD -> " (hard)";
            case SOFT -> " (soft)";
            case NONE -> "";
        };
        // A V grade names its scale already (V4); the others need the name (Font 6A+, French 6a+).
        return (scale == GradeScale.V ? "" : scale.displayName() + " ") + canonical + flag;
    }
}
