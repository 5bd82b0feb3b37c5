package org.variset.archive.grade;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;

/**
 * Converts grades between scales through the IRCRA table. A grade that spans several rows converts to every
 * grade of the target scale on those rows (docs/spec/grades.md), so {@code V2} gives Font {@code 5+, 6A, 6A+}.
 */
public final class GradeConverter {

    private final GradeTable table;

    /** A converter over the given table. */
    public GradeConverter(GradeTable table) {
        this.table = table;
    }

    /** A converter over the standard IRCRA table. */
    public static GradeConverter standard() {
        return new GradeConverter(GradeTable.standard());
    }

    /**
     * The grades of the target scale on the rows the grade spans, easiest first.
     *
     * @return the equivalents; empty when the target column has no grade on those rows (Font below level 11)
     */
    public List<String> equivalents(Grade grade, GradeScale target) {
        Set<String> out = new LinkedHashSet<>();
        for (int level = grade.lowLevel(); level <= grade.highLevel(); level++) {
            if (target == GradeScale.IRCRA) {
                out.add(String.valueOf(level));
            } else if (level > GradeTable.LAST_LEVEL) {
                out.add(GradeNotation.extendedName(target, level));
            } else {
                out.addAll(table.gradesAt(target, level));
            }
        }
        return new ArrayList<>(out);
    }
}
