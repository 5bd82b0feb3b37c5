package org.variset.archive.grade;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;

/**
 * Converts grades between scales through the IRCRA table (docs/spec/grades.md, "Grade ranges"). A grade's own scale
 * shows the grade itself. In another scale its equivalents are the grades whose centre (the midpoint of the rows they
 * span) lies within the rows the grade covers, edges included, the rule a search uses; so {@code V2} (rows 15 and 16)
 * gives Font {@code 5+, 6A, 6A+}, and in V itself only {@code V2}, not the {@code V3} that shares its row 16. Where no grade of the target scale is
 * centred within them (a gap in the column), the grades on the rows themselves are given.
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
     * The grades of the target scale equivalent to a grade, easiest first.
     *
     * @return the equivalents; empty when the target column has no grade on those rows (Font below level 11)
     */
    public List<String> equivalents(Grade grade, GradeScale target) {
        if (target == grade.scale()) {
            return List.of(grade.canonical());
        }
        Set<String> centred = new LinkedHashSet<>();
        Set<String> onRows = new LinkedHashSet<>();
        for (int level = grade.lowLevel() - 1; level <= grade.highLevel() + 1; level++) {
            boolean own = level >= grade.lowLevel() && level <= grade.highLevel();
            if (target == GradeScale.IRCRA || level > GradeTable.LAST_LEVEL) {
                String name =
                        target == GradeScale.IRCRA ? String.valueOf(level) : GradeNotation.extendedName(target, level);
                if (own) {
                    centred.add(name);
                }
                continue;
            }
            for (String g : table.gradesAt(target, level)) {
                int[] span = table.span(target, g);
                double centre = (span[0] + span[1]) / 2.0;
                if (centre >= grade.rowsLow() - 1e-9 && centre <= grade.rowsHigh() + 1e-9) {
                    centred.add(g);
                }
                if (own) {
                    onRows.add(g);
                }
            }
        }
        return new ArrayList<>(centred.isEmpty() ? onRows : centred);
    }
}
