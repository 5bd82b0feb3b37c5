package org.variset.archive.grade;

/**
 * A {@code +} or {@code -} written after a grade that the table does not list for that grade ({@code V4+}).
 * The grade keeps its table value; the modifier is kept as a flag ("hard V4", docs/spec/grades.md).
 */
public enum GradeModifier {
    /** No unlisted modifier. */
    NONE,
    /** An unlisted {@code +}: the setters mean a hard grade. */
    HARD,
    /** An unlisted {@code -}: the setters mean a soft grade. */
    SOFT;

    static GradeModifier of(char c) {
        return c == '+' ? HARD : c == '-' ? SOFT : NONE;
    }
}
