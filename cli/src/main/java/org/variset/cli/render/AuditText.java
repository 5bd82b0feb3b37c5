package org.variset.cli.render;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.stream.Collectors;
import org.variset.archive.grade.Discipline;
import org.variset.archive.problem.Remedy;
import org.variset.reports.Safety;
import org.variset.reports.audit.Audit;
import org.variset.reports.audit.Finding;
import org.variset.reports.audit.Headline;
import org.variset.reports.audit.SetResult;
import org.variset.reports.catalogue.Figure;
import org.variset.reports.catalogue.Figures;
import org.variset.reports.figures.FeatureText;
import org.variset.reports.figures.SetFigures;
import org.variset.reports.format.FigureFormat;
import org.variset.reports.scoring.grades.GradeFigures;
import org.variset.reports.scoring.grip.CircularStatistics;
import org.variset.reports.scoring.grip.GripStatistics;
import org.variset.reports.scoring.profile.ProfileClass;
import org.variset.reports.scoring.variety.VarietyFigures;

/** An audit as text for people: the score, what stands out, the side-by-side figures, then each family. */
public final class AuditText {
    private final StringBuilder b = new StringBuilder();

    private AuditText() {}

    /** The audit as text; {@code findings} limits how many findings are shown (all are in the JSON). */
    public static String of(Audit a, int findings) {
        AuditText t = new AuditText();
        t.write(a, findings);
        return t.b.toString();
    }

    private void write(Audit a, int shown) {
        SetResult s = a.audited();
        line(a.subject().title() + " · " + a.subject().gym() + " · "
                + FigureFormat.count(s.routes().size(), "route"));
        line(score(s));
        line("");
        line("What stands out");
        a.findings().stream().limit(shown).forEach(f -> line("  - " + finding(f)));
        if (a.findings().size() > shown) {
            line("  (" + (a.findings().size() - shown) + " more with --format json)");
        }
        line("");
        table(a);
        line("");
        families(s);
        line("");
        line(settings(a));
        line("Safety: " + Safety.CAUTION);
    }

    /** A finding in the command line's words: its sentence, then what to do when there is more than resetting. */
    public static String finding(Finding f) {
        if (f.remedy().kind() == Remedy.Kind.NONE) {
            return f.text();
        }
        String t = f.text().endsWith(".") ? f.text().substring(0, f.text().length() - 1) : f.text();
        return t + ": " + CliWords.remedy(f.remedy()) + ".";
    }

    private static String score(SetResult s) {
        if (s.score().score() == null) {
            return "Score: none (" + s.undefined().getOrDefault("score", "too few parts") + ")";
        }
        String parts = s.score().weightsUsed().keySet().stream()
                .map(k -> k + " " + FigureFormat.round(s.score().parts().get(k), 2))
                .collect(Collectors.joining(", "));
        return "Score " + Figures.SCORE.text(s.score().score()) + " of 100 (a heuristic: weighted mean of "
                + parts
                + (s.score().dropped().isEmpty()
                        ? ""
                        : "; not measured: " + String.join(", ", s.score().dropped())) + ")";
    }

    private void table(Audit a) {
        List<SetResult> cols = a.columns();
        List<Map<String, Double>> values = cols.stream().map(Headline::of).toList();
        List<String> head = new ArrayList<>();
        head.add("");
        for (int i = 0; i < cols.size(); i++) {
            head.add(cols.get(i).name());
            if (i == 1 && a.previous() != null) {
                head.add("change");
            }
        }
        List<List<String>> rows = new ArrayList<>();
        rows.add(head);
        for (Figure k : Figures.HEADLINE) {
            List<String> row = new ArrayList<>();
            row.add(k.label());
            for (int i = 0; i < cols.size(); i++) {
                row.add(k.text(values.get(i).get(k.key())));
                if (i == 1 && a.previous() != null) {
                    row.add(k.change(values.get(0).get(k.key()), values.get(1).get(k.key())));
                }
            }
            rows.add(row);
        }
        int[] w = new int[head.size()];
        rows.forEach(r -> {
            for (int i = 0; i < r.size(); i++) {
                w[i] = Math.max(w[i], r.get(i).length());
            }
        });
        for (List<String> r : rows) {
            StringBuilder x = new StringBuilder("  ").append(pad(r.get(0), w[0], false));
            for (int i = 1; i < r.size(); i++) {
                x.append("  ").append(pad(r.get(i), w[i], true));
            }
            line(x.toString().stripTrailing());
        }
    }

    private void families(SetResult s) {
        SetFigures f = s.figures();
        GripStatistics g = f.grip();
        List<String> sectors = new ArrayList<>();
        for (int i = 0; i < 8; i++) {
            sectors.add(CircularStatistics.sectorWord(i) + " " + g.sectors().get(i));
        }
        line("Grip directions  " + FigureFormat.count(g.n(), "hand grip") + " ("
                + FigureFormat.count(g.undirected(), "hold", "holds") + " without a direction): "
                + String.join(", ", sectors) + "; mean direction "
                + Figures.GRIP_MEAN_DIRECTION.text(g.meanDirectionDeg()) + "°, resultant length "
                + Figures.GRIP_RESULTANT.text(g.resultantLength()) + ", Rayleigh p "
                + Figures.GRIP_RAYLEIGH_P.text(g.rayleighP())
                + " (small on most walls: gravity favours up-facing holds)");
        line("Hold types       " + variety(f.holds(), Figures.HOLDS));
        line("Hold shapes      " + variety(f.holdShapes(), Figures.HOLD_SHAPES));
        line("Sizes            " + variety(f.sizes(), Figures.SIZES));
        line("Moves            " + variety(f.moves(), Figures.MOVES));
        line("Styles           " + variety(f.styles(), Figures.STYLES));
        line("Wall angles      " + variety(f.angles(), Figures.ANGLES));
        for (Map.Entry<Discipline, GradeFigures> e : f.grades().entrySet()) {
            line(pad("Grades (" + e.getKey().word() + ")", 17, false) + grades(e.getValue()));
        }
        line("Profiles         " + profiles(f));
        line("Repetition       " + repetition(s));
        line("Route lines      " + FigureFormat.count(f.line().withGie(), "route") + " with a full line: GIE mean "
                + Figures.GIE_MEAN.text(f.line().gieMean()) + " (min "
                + Figures.GIE_MIN.text(f.line().gieMin()) + ", max "
                + Figures.GIE_MAX.text(f.line().gieMax()) + "); "
                + FigureFormat.count(f.line().flagged().size(), "route")
                + " with a span over "
                + Figures.SPAN.text(f.line().reachK() * f.line().reachHeightM())
                + " m (heuristic)");
    }

    private static String variety(VarietyFigures v, Figures.Variety c) {
        if (v.n() == 0) {
            return "none recorded" + (v.missing() > 0 ? " (" + v.missing() + " without a value)" : "");
        }
        String counts = v.counts().entrySet().stream()
                .sorted(Map.Entry.<String, Long>comparingByValue().reversed().thenComparing(Map.Entry.comparingByKey()))
                .limit(10)
                .map(e -> e.getKey() + " " + e.getValue())
                .collect(Collectors.joining(", "));
        return counts + (v.richness() > 10 ? ", ..." : "") + "; effective number "
                + c.hillN1().text(v.hillN1())
                + (v.coverage() == null ? "" : ", coverage " + c.coverage().text(v.coverage()))
                + (v.missing() > 0 ? "; " + v.missing() + " without a value" : "");
    }

    private static String grades(GradeFigures g) {
        String h = g.histogram().entrySet().stream()
                .filter(e ->
                        e.getValue() > 0 || g.target() != null && g.target().getOrDefault(e.getKey(), 0.0) > 0)
                .map(e -> e.getKey() + " " + e.getValue()
                        + (g.target() == null || !g.target().containsKey(e.getKey())
                                ? ""
                                : " (target " + FigureFormat.percent(g.target().get(e.getKey())) + ")"))
                .collect(Collectors.joining(", "));
        return h
                + (g.emdToTarget() == null
                        ? "; no target"
                        : "; " + Figures.GRADES_DISTANCE.text(g.emdToTarget()) + " bands from target")
                + (g.outsideTarget() > 0 ? "; " + g.outsideTarget() + " outside the target's bands" : "");
    }

    private static String profiles(SetFigures f) {
        String c = f.profiles().counts().entrySet().stream()
                .map(e -> e.getKey().key().replace('_', ' ') + " " + e.getValue())
                .collect(Collectors.joining(", "));
        return c + "; spread " + Figures.PROFILE_SPREAD.text(f.profiles().splitEntropy())
                + (f.profiles().counts().get(ProfileClass.UNCLASSIFIED) > 0
                        ? " (unclassified: fewer than three " + "move difficulties)"
                        : "");
    }

    private static String repetition(SetResult s) {
        if (s.repetition() == null) {
            return "not measured";
        }
        int near = s.repetition().nearRepeats().size();
        int inside = s.repetition().internalRepeats().size();
        String window = s.windowRoutes() > 0 || s.repetition().novelty() != null
                ? FigureFormat.count(near, "near-repeat") + " of the " + FigureFormat.count(s.windowRoutes(), "route")
                        + " set in the look-back window; "
                : "";
        return window + inside + " inside this set; novelty "
                + Figures.NOVELTY.text(s.repetition().novelty())
                + "; hold reuse " + FigureFormat.percent(s.holdReuseRate())
                + (s.repetition().notEnoughDetail().isEmpty()
                        ? ""
                        : "; too little detail to compare: "
                                + FeatureText.list(s.repetition().notEnoughDetail(), 5));
    }

    private static String settings(Audit a) {
        StringBuilder x =
                new StringBuilder("Settings: look-back " + a.settings().lookbackDays()
                        + " days, near-repeat threshold "
                        + a.settings().nearRepeatThreshold().toPlainString() + ", reach "
                        + Figures.REACH_FACTOR.text(a.settings().reachFactor()) + " × "
                        + Figures.REACH_HEIGHT.text(a.settings().reachHeightM()) + " m");
        for (Discipline d : Discipline.values()) {
            x.append(", ")
                    .append(d.word())
                    .append(" target: ")
                    .append(
                            a.settings().target(d) == null
                                    ? "none"
                                    : a.settings().targetIsDefault(d)
                                            ? "the example pyramid (common practice)"
                                            : "the gym's own");
        }
        return x.toString();
    }

    private static String pad(String s, int w, boolean right) {
        String p = " ".repeat(Math.max(0, w - s.length()));
        return right ? p + s : s + p;
    }

    private void line(String s) {
        b.append(s).append('\n');
    }
}
