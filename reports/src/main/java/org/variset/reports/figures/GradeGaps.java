package org.variset.reports.figures;

import java.util.List;
import org.variset.reports.scoring.grades.GradeFigures;

/**
 * The grade gaps worth telling people about: target bands with no route where the target expects at least two
 * routes (a heuristic of ours: a missing band the target gives a fraction of a route is noise).
 */
public final class GradeGaps {
    /** The least number of routes the target must expect in a band for its gap to count. */
    public static final double EXPECTED_ROUTES = 2;

    private GradeGaps() {}

    /** The notable gaps of a grade block, in band order; empty without a target. */
    public static List<String> notable(GradeFigures g) {
        if (g.target() == null) {
            return List.of();
        }
        long inside = routesInTarget(g);
        return g.gaps().stream()
                .filter(b -> g.target().get(b) * inside >= EXPECTED_ROUTES)
                .toList();
    }

    /** How many routes fall in the target's bands. */
    public static long routesInTarget(GradeFigures g) {
        return g.target().keySet().stream()
                .mapToLong(b -> g.histogram().getOrDefault(b, 0L))
                .sum();
    }
}
