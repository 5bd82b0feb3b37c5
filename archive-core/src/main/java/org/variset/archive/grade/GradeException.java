package org.variset.archive.grade;

import java.util.List;

/**
 * A grade that cannot be read: not a grade at all, or one that fits two scales. The message says what was
 * expected; {@link #readings()} lists the candidate readings of an ambiguous grade.
 */
public final class GradeException extends IllegalArgumentException {
    private static final long serialVersionUID = 1L;

    private final transient List<Grade> readings;

    GradeException(String message, List<Grade> readings) {
        super(message);
        this.readings = List.copyOf(readings);
    }

    /** The readings a grade fits when it is ambiguous; empty when it fits none. */
    public List<Grade> readings() {
        return readings;
    }

    /** True when the grade fits more than one scale. */
    public boolean ambiguous() {
        return readings.size() > 1;
    }
}
