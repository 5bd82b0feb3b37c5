package org.variset.reports.audit;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.stream.Collectors;
import org.variset.archive.grade.Discipline;
import org.variset.reports.catalogue.Figures;
import org.variset.reports.figures.FeatureText;
import org.variset.reports.figures.ProfileFigures;
import org.variset.reports.figures.RouteLineFigures;
import org.variset.reports.figures.SetFigures;
import org.variset.reports.format.FigureFormat;
import org.variset.reports.scoring.grades.GradeFigures;
import org.variset.reports.scoring.grip.CircularStatistics;
import org.variset.reports.scoring.grip.GripStatistics;
import org.variset.reports.scoring.profile.ProfileClass;
import org.variset.reports.scoring.variety.VarietyFigures;

/**
 * Turns an audit's figures into the few sentences that matter, most important first. The thresholds below are
 * heuristics of ours for what is worth a sentence, not published values; each names what it looks at.
 */
final class Findings {
    /** A sector holding at least this share of the hand grips is worth a sentence. */
    private static final double DOMINANT_SECTOR = 0.5;
    /** A move on at least this share of the window's routes is missed when a reset has none. */
    private static final double USUAL_MOVE = 0.2;
    /** Hold reuse at or above this share is worth a sentence. */
    private static final double HIGH_REUSE = 0.3;

    private final Audit audit;
    private final SetFigures f;
    private final List<Finding> out = new ArrayList<>();

    private Findings(Audit audit) {
        this.audit = audit;
        this.f = audit.audited().figures();
    }

    /** The audit with its findings. */
    static Audit complete(Audit a) {
        Findings x = new Findings(a);
        x.find();
        List<Finding> sorted = x.out.stream()
                .sorted(Comparator.comparingDouble(Finding::weight).reversed())
                .toList();
        return new Audit(
                a.subject(), a.settings(), a.audited(), a.previous(), a.reference(), a.windowMoveShares(), sorted);
    }

    private void find() {
        if (audit.audited().routes().isEmpty()) {
            out.add(new Finding("empty", 10, "No route in this set: there is nothing to audit."));
            return;
        }
        if (f.holds().n() == 0) {
            out.add(new Finding(
                    "no_holds",
                    6,
                    "No hold placements are recorded for these routes: the grip and "
                            + "hold figures are empty. Import a holds file to measure them."));
        }
        grip();
        RepeatFindings.add(audit, out);
        missingMoves();
        holdReuse();
        holdTypes();
        profiles();
        reach();
        GradeFindings.add(audit, out);
        GradeFindings.holes(audit, out);
        SetterHabits.add(audit, out);
        changes();
    }

    private void grip() {
        GripStatistics g = f.grip();
        if (g.n() < 5) {
            return;
        }
        int top = 0;
        for (int s = 1; s < 8; s++) {
            top = g.sectors().get(s) > g.sectors().get(top) ? s : top;
        }
        int k = g.sectors().get(top);
        boolean downFacing =
                g.sectors().get(3) + g.sectors().get(4) + g.sectors().get(5) > 0
                        || f.moves().counts().containsKey("undercling");
        boolean gaston = f.moves().counts().containsKey("gaston");
        List<String> missing = new ArrayList<>();
        if (!downFacing) {
            missing.add("undercling (no grip faces down)");
        }
        if (!gaston) {
            missing.add("gaston");
        }
        String none = missing.isEmpty() ? "" : "; no " + String.join(" or ", missing) + " in this set";
        if (k >= DOMINANT_SECTOR * g.n()) {
            out.add(new Finding(
                    "grip",
                    8 + k / (double) g.n(),
                    k + " of " + g.n() + " hand grips face " + CircularStatistics.sectorWord(top) + none + "."));
        } else if (!missing.isEmpty()) {
            out.add(new Finding("grip", 5, "No " + String.join(" or ", missing) + " in this set."));
        }
    }

    private void missingMoves() {
        List<String> usual = audit.windowMoveShares().entrySet().stream()
                .filter(e -> e.getValue() >= USUAL_MOVE && !f.moves().counts().containsKey(e.getKey()))
                .sorted(Map.Entry.<String, Double>comparingByValue().reversed())
                .limit(4)
                .map(e -> e.getKey() + " (" + FigureFormat.percent(e.getValue()) + ")")
                .toList();
        if (!usual.isEmpty()) {
            out.add(new Finding(
                    "missing_moves",
                    6,
                    "Not on this reset, though usual before it: " + String.join(", ", usual)
                            + " of the gym's routes over the last "
                            + audit.settings().lookbackDays() + " days."));
        }
    }

    private void holdReuse() {
        Double r = audit.audited().holdReuseRate();
        if (r != null && r >= HIGH_REUSE) {
            out.add(new Finding(
                    "hold_reuse",
                    6 + r,
                    FigureFormat.percent(r) + " of this reset's placements put a "
                            + "hold shape back in the orientation it had on this wall in its last three resets."));
        }
    }

    private void holdTypes() {
        VarietyFigures h = f.holds();
        if (h.n() >= 20 && h.richness() <= 3) {
            String types = h.counts().entrySet().stream()
                    .filter(e -> e.getValue() > 0)
                    .map(Map.Entry::getKey)
                    .collect(Collectors.joining(", "));
            out.add(new Finding(
                    "hold_types",
                    5,
                    "Only " + h.richness() + " hold types (" + types + ") across " + h.n() + " placements."));
        }
    }

    private void profiles() {
        ProfileFigures p = f.profiles();
        long classified = p.classified();
        for (ProfileClass c : ProfileClass.values()) {
            if (c != ProfileClass.UNCLASSIFIED && classified >= 3 && p.counts().get(c) == classified) {
                out.add(new Finding(
                        "profiles",
                        4,
                        "All " + classified + " routes with move difficulties are "
                                + c.key().replace('_', ' ') + ": the set trains one kind of effort."));
            }
        }
    }

    private void reach() {
        double limit = f.line().reachK() * f.line().reachHeightM();
        List<RouteLineFigures> flagged = f.line().flagged();
        String caveat =
                " (longer than " + Figures.SPAN.text(limit) + " m; a heuristic, not a measurement of any " + "climber)";
        if (flagged.size() > 2) {
            out.add(new Finding(
                    "reach",
                    3,
                    flagged.size() + " routes have a span between hand holds" + caveat
                            + ": "
                            + FeatureText.list(
                                    flagged.stream()
                                            .map(r -> r.route() + " "
                                                    + Figures.SPAN.text(r.spans()
                                                            .get(r.longSpans().get(0))) + " m")
                                            .toList(),
                                    4)
                            + "."));
            return;
        }
        for (RouteLineFigures r : flagged) {
            int i = r.longSpans().get(0);
            out.add(new Finding(
                    "reach",
                    3,
                    r.route() + ": a " + Figures.SPAN.text(r.spans().get(i)) + " m span between hand holds " + (i + 1)
                            + " and " + (i + 2) + caveat + "."));
        }
    }

    private void changes() {
        SetResult p = audit.previous();
        if (p == null) {
            return;
        }
        Double now = f.grip().sectorEntropy();
        Double before = p.figures().grip().sectorEntropy();
        if (now != null && before != null && Math.abs(now - before) >= 0.1) {
            out.add(new Finding(
                    "change",
                    4,
                    "Grip variety (sector entropy) " + (now < before ? "fell" : "rose")
                            + " from " + Figures.GRIP_SECTOR_ENTROPY.text(before) + " to "
                            + Figures.GRIP_SECTOR_ENTROPY.text(now) + " since the " + p.name() + "."));
        }
    }

    /** The grade figures of the main discipline of a set, or null. */
    static GradeFigures mainGrades(SetFigures figures) {
        return figures.grades()
                .getOrDefault(Discipline.BOULDER, figures.grades().get(Discipline.ROPE));
    }
}
