package org.variset.reports.figures;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
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

    /**
     * A run of adjacent target bands with no route.
     *
     * @param bands the bands, easiest first
     * @param targetShare the target's share in them (of the target's whole)
     * @param expectedRoutes how many routes the target expects in them, for the routes in the target's bands
     */
    public record Run(List<String> bands, double targetShare, double expectedRoutes) {
        /** After "no boulder": "from V2 to V5", or for two bands "V2 or V3". */
        public String words() {
            return bands.size() == 2
                    ? bands.get(0) + " or " + bands.get(1)
                    : "from " + bands.get(0) + " to " + bands.get(bands.size() - 1);
        }
    }

    /** The least number of adjacent empty bands that make a run (a heuristic of ours: one missing band is a gap). */
    public static final int RUN_BANDS = 2;

    /**
     * The runs of at least {@value #RUN_BANDS} adjacent target bands (target share above zero, in band order) with no
     * route: a whole range the target expects and the set lacks. Empty without a target.
     */
    public static List<Run> runs(GradeFigures g) {
        if (g.target() == null) {
            return List.of();
        }
        return runs(g, new ArrayList<>(g.target().keySet()));
    }

    /**
     * The runs of empty target bands strictly between a set's easiest and hardest routes: a hole inside the range it
     * covers (a reset of V0, V1 and V6 problems has a hole from V2 to V5). Empty without a target.
     */
    public static List<Run> holes(GradeFigures g) {
        if (g.target() == null) {
            return List.of();
        }
        List<String> bands = new ArrayList<>(g.target().keySet());
        int first = -1;
        int last = -1;
        for (int i = 0; i < bands.size(); i++) {
            if (g.histogram().getOrDefault(bands.get(i), 0L) > 0) {
                first = first < 0 ? i : first;
                last = i;
            }
        }
        return first < 0 ? List.of() : runs(g, bands.subList(first, last + 1));
    }

    /** The share of the target's weight that lies in runs of empty bands. */
    public static double missingShare(GradeFigures g) {
        return runs(g).stream().mapToDouble(Run::targetShare).sum();
    }

    /**
     * The share of the target's weight in the bands that are missing as a range, from the standing set (its runs) or
     * inside an audited set's own range (its holes), each band counted once.
     *
     * @param standing the grades the score reads (the gym's standing set, or the set itself)
     * @param own the audited set's own grades, or null
     */
    public static double missingShare(GradeFigures standing, GradeFigures own) {
        if (standing.target() == null) {
            return 0;
        }
        Set<String> bands = new LinkedHashSet<>();
        runs(standing).forEach(r -> bands.addAll(r.bands()));
        if (own != null && own.target() != null) {
            holes(own).forEach(r -> bands.addAll(r.bands()));
        }
        double total = standing.target().values().stream()
                .mapToDouble(Double::doubleValue)
                .sum();
        return bands.stream()
                        .mapToDouble(b -> standing.target().getOrDefault(b, 0.0))
                        .sum()
                / total;
    }

    private static List<Run> runs(GradeFigures g, List<String> bands) {
        double total =
                g.target().values().stream().mapToDouble(Double::doubleValue).sum();
        long inside = routesInTarget(g);
        List<Run> out = new ArrayList<>();
        List<String> run = new ArrayList<>();
        for (int i = 0; i <= bands.size(); i++) {
            boolean empty = i < bands.size()
                    && g.target().get(bands.get(i)) > 0
                    && g.histogram().getOrDefault(bands.get(i), 0L) == 0;
            if (empty) {
                run.add(bands.get(i));
            } else {
                if (run.size() >= RUN_BANDS) {
                    double share =
                            run.stream().mapToDouble(b -> g.target().get(b)).sum() / total;
                    out.add(new Run(List.copyOf(run), share, share * inside));
                }
                run.clear();
            }
        }
        return out;
    }
}
