package org.variset.reports.audit;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.variset.archive.grade.Discipline;
import org.variset.archive.problem.Remedy;
import org.variset.reports.catalogue.Figures;
import org.variset.reports.figures.FeatureText;
import org.variset.reports.figures.GradeGaps;
import org.variset.reports.figures.SetFigures;
import org.variset.reports.format.FigureFormat;
import org.variset.reports.scoring.grades.GradeFigures;

/**
 * Sentences on grades against the target, read on the gym's routes up that day: a single wall is not meant to
 * cover the whole target (docs/spec/metrics.md section 7), so a reset or wall audit looks at the gym's standing set.
 */
final class GradeFindings {
    /** A distance to target of at least this many bands is worth a sentence (a heuristic of ours). */
    private static final double FAR = 0.5;

    private GradeFindings() {}

    static void add(Audit audit, List<Finding> out) {
        Subject.Kind k = audit.subject().kind();
        if (k == Subject.Kind.SETTER) {
            return;
        }
        boolean whole = k == Subject.Kind.GYM_STANDING;
        SetFigures standing =
                whole ? audit.audited().figures() : audit.reference().figures();
        // A reset or a wall is not meant to cover the target itself: the gym's grades weigh less in its audit.
        double weight = whole ? 7 : 4;
        String where = "the gym's " + "%s up on " + audit.subject().on();
        for (Map.Entry<Discipline, GradeFigures> e : standing.grades().entrySet()) {
            Discipline d = e.getKey();
            if (!whole && !audit.audited().figures().grades().containsKey(d)) {
                continue;
            }
            GradeFigures g = e.getValue();
            String whose = String.format(where, d == Discipline.BOULDER ? "boulders" : "rope routes");
            Remedy setTarget = Remedy.of(Remedy.Kind.SET_TARGET, "discipline", d.word());
            if (g.target() == null) {
                out.add(new Finding("no_target", 2, "No grade target for " + d.word() + " routes yet.", setTarget));
                continue;
            }
            boolean isExample = audit.settings().targetIsDefault(d);
            String example = isExample ? " (against the example pyramid)" : "";
            Remedy remedy = isExample ? setTarget : Remedy.NONE;
            long inside = GradeGaps.routesInTarget(g);
            List<GradeGaps.Run> runs = GradeGaps.runs(g);
            ranges(audit, d, g, weight, example, remedy, out);
            List<String> inRuns = runs.stream().flatMap(r -> r.bands().stream()).toList();
            List<String> gaps = GradeGaps.notable(g).stream()
                    .filter(b -> !inRuns.contains(b))
                    .toList();
            if (!gaps.isEmpty()) {
                List<String> wanted = new ArrayList<>();
                gaps.forEach(b -> wanted.add(FigureFormat.round(g.target().get(b) * inside, 1)));
                out.add(new Finding(
                        "grade_gap",
                        weight + gaps.size() * 0.1,
                        "No " + FeatureText.list(gaps, 5).replace(" and ", " or ") + " among " + whose
                                + ", where the target expects "
                                + FeatureText.list(wanted, 5) + example + ".",
                        remedy));
            }
            if (g.emdToTarget() != null && g.emdToTarget() >= FAR) {
                out.add(new Finding(
                        "grade_distance",
                        weight - 1.5 + g.emdToTarget(),
                        capitalised(whose)
                                + " sit on average " + Figures.GRADES_DISTANCE.text(g.emdToTarget())
                                + " bands from the "
                                + "target" + skew(g) + (gaps.isEmpty() ? example : "") + ".",
                        gaps.isEmpty() ? remedy : Remedy.NONE));
            }
        }
    }

    /** "No boulder from V2 to V5 is up in the gym on DAY, a range where the target expects 6.4 of its 30 routes." */
    private static void ranges(
            Audit audit,
            Discipline d,
            GradeFigures g,
            double weight,
            String example,
            Remedy remedy,
            List<Finding> out) {
        long inside = GradeGaps.routesInTarget(g);
        for (GradeGaps.Run run : GradeGaps.runs(g)) {
            out.add(new Finding(
                    "grade_range_gap",
                    weight + 2.5 + run.targetShare(),
                    "No " + (d == Discipline.BOULDER ? "boulder" : "rope route") + " " + run.words()
                            + " is up in the gym on " + audit.subject().on() + ", a range where the target "
                            + "expects " + FigureFormat.round(run.expectedRoutes(), 1) + " of its " + inside
                            + " routes" + example + ".",
                    remedy));
        }
    }

    /** A reset of at least this many routes with a hole in its own range is worth a sentence (heuristic of ours). */
    private static final int HOLE_ROUTES = 4;

    /** Holes in a reset's own grades: bands the target expects, missing between its easiest and hardest routes. */
    static void holes(Audit audit, List<Finding> out) {
        if (audit.subject().kind() != Subject.Kind.RESET
                || audit.audited().routes().size() < HOLE_ROUTES) {
            return;
        }
        for (Map.Entry<Discipline, GradeFigures> e :
                audit.audited().figures().grades().entrySet()) {
            GradeFigures g = e.getValue();
            List<String> bands =
                    g.target() == null ? List.of() : List.copyOf(g.target().keySet());
            List<String> present = bands.stream()
                    .filter(b -> g.histogram().getOrDefault(b, 0L) > 0)
                    .toList();
            for (GradeGaps.Run hole : GradeGaps.holes(g)) {
                out.add(new Finding(
                        "grade_hole",
                        7.4 + hole.targetShare(),
                        "This reset has no " + (e.getKey() == Discipline.BOULDER ? "boulder" : "rope route") + " "
                                + hole.words() + ", between its " + present.get(0) + " and its "
                                + present.get(present.size() - 1) + " routes."));
            }
        }
    }

    /** ": more V3 than aimed at (12 against 7), fewer V6 (1 against 5)". */
    private static String skew(GradeFigures g) {
        long inside = g.target().keySet().stream()
                .mapToLong(b -> g.histogram().getOrDefault(b, 0L))
                .sum();
        String over = null;
        String under = null;
        double most = 0;
        double least = 0;
        for (Map.Entry<String, Double> t : g.target().entrySet()) {
            double expected = t.getValue() * inside;
            double diff = g.histogram().getOrDefault(t.getKey(), 0L) - expected;
            String count = " (" + g.histogram().getOrDefault(t.getKey(), 0L) + " against "
                    + FigureFormat.round(expected, 1) + ")";
            if (diff > most) {
                most = diff;
                over = t.getKey() + " than aimed at" + count;
            }
            if (diff < least) {
                least = diff;
                under = t.getKey() + count;
            }
        }
        List<String> parts = new ArrayList<>();
        if (over != null) {
            parts.add("more " + over);
        }
        if (under != null) {
            parts.add("fewer " + under);
        }
        return parts.isEmpty() ? "" : ": " + String.join(", ", parts);
    }

    private static String capitalised(String s) {
        return Character.toUpperCase(s.charAt(0)) + s.substring(1);
    }
}
