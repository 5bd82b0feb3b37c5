package org.variset.reports.pdf;

import java.io.OutputStream;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.variset.archive.grade.Discipline;
import org.variset.archive.problem.Remedy;
import org.variset.reports.audit.Audit;
import org.variset.reports.audit.Headline;
import org.variset.reports.audit.SetResult;
import org.variset.reports.audit.Subject;
import org.variset.reports.catalogue.Figure;
import org.variset.reports.catalogue.Figures;
import org.variset.reports.figures.FeatureText;
import org.variset.reports.figures.RouteLineFigures;
import org.variset.reports.figures.SetFigures;
import org.variset.reports.format.FigureFormat;
import org.variset.reports.plan.ResetPlan;
import org.variset.reports.scoring.grades.GradeFigures;
import org.variset.reports.scoring.grip.GripStatistics;
import org.variset.reports.scoring.line.RouteLine;
import org.variset.reports.scoring.profile.ProfileClass;
import org.variset.reports.scoring.repetition.RepetitionFigures;
import org.variset.reports.scoring.variety.VarietyFigures;

/**
 * The audit as a PDF: a first page a setter reads in thirty seconds (the score with its parts, what changed since
 * the wall's previous reset, the findings, the safety caution), then a section per family of figures with its
 * chart, the repetition table, route lines and reach flags, and the plan for the wall's next reset. Every figure is
 * rounded by {@link FigureFormat}, as in the text output.
 */
public final class AuditPdf {
    private final Audit a;
    private final ResetPlan plan;
    private final PdfDoc doc;

    private AuditPdf(Audit a, ResetPlan plan, PdfDoc doc) {
        this.a = a;
        this.plan = plan;
        this.doc = doc;
    }

    /**
     * Writes the audit.
     *
     * @param plan the plan for the wall's next reset, or null
     * @return characters no font could print (empty when every name printed)
     */
    public static Set<String> write(Audit a, ResetPlan plan, PdfOptions options, OutputStream out) {
        String kind = switch (a.subject().kind()) {
            case RESET -> "Reset audit";
            case SETTER -> "Setter audit";
            default -> "Standing-set audit";
        };
        try (PdfDoc doc = new PdfDoc(
                out, options, kind, a.subject().title() + " · " + a.subject().gym())) {
            new AuditPdf(a, plan, doc).write();
            return Set.copyOf(doc.missingCharacters());
        }
    }

    private void write() {
        firstPage();
        doc.heading("Figures side by side", true);
        sideBySide();
        grips();
        holds();
        grades();
        moves();
        profiles();
        repetition();
        lines();
        if (plan != null) {
            PlanSection.write(doc, plan);
        }
        settings();
    }

    private void firstPage() {
        SetResult s = a.audited();
        doc.paragraph(
                FigureFormat.count(s.routes().size(), "route") + " · "
                        + (a.subject().kind() == Subject.Kind.SETTER
                                ? "set " + a.subject().period()
                                : "on " + a.subject().on()),
                PdfDoc.BODY,
                false,
                Palette.MUTED);
        doc.paragraph("Score " + Figures.SCORE.text(s.score().score()) + " of 100", 22, true, Palette.BLUE);
        if (s.score().score() == null) {
            doc.paragraph(s.undefined().getOrDefault("score", "too few of its parts could be measured"));
        }
        List<List<String>> rows = new ArrayList<>();
        s.score()
                .parts()
                .forEach((part, v) -> rows.add(List.of(
                        part,
                        v == null ? FigureFormat.NONE : FigureFormat.round(v, 2),
                        s.score().weightsUsed().containsKey(part)
                                ? FigureFormat.round(s.score().weightsUsed().get(part), 2)
                                : "not measured")));
        doc.table(List.of("part of the score", "value (0-1)", "weight used"), rows, new float[] {3, 1.3f, 1.3f});
        doc.paragraph(
                "The score is a heuristic of ours: a weighted mean of its parts (grip-direction spread, "
                        + "hold-type and move coverage, the gym's grades against the target, novelty). Read the parts "
                        + "beside it.",
                7.5f,
                false,
                Palette.MUTED);
        if (a.previous() != null) {
            doc.heading("Since the " + a.previous().name(), false);
            doc.bullets(changes());
        }
        doc.heading("What stands out", false);
        doc.bullets(a.findings().stream()
                .limit(10)
                .map(f -> DocumentWords.withRemedy(f.text(), f.remedy()))
                .toList());
        doc.safety();
    }

    /** The four headline figures that moved most since the previous reset, in words. */
    private List<String> changes() {
        Map<String, Double> now = Headline.of(a.audited());
        Map<String, Double> before = Headline.of(a.previous());
        List<Map.Entry<Figure, Double>> moved = new ArrayList<>();
        for (Figure k : Figures.HEADLINE) {
            Double n = now.get(k.key());
            Double b = before.get(k.key());
            if (n != null && b != null && k != Figures.SCORE) {
                // Effective numbers run to tens while the other figures lie in [0, 1]: compare like with like.
                double scale = k.unit() == Figure.Unit.NUMBER && k.decimals() == 1 ? 10 : 1;
                moved.add(Map.entry(k, Math.abs(n - b) / scale));
            }
        }
        moved.sort(Map.Entry.<Figure, Double>comparingByValue().reversed());
        List<String> out = new ArrayList<>();
        out.add(change(Figures.SCORE, now, before));
        moved.stream().limit(4).forEach(e -> out.add(change(e.getKey(), now, before)));
        return out;
    }

    /** "grip direction spread (sector entropy): 0.71 → 0.80, better". */
    private static String change(Figure f, Map<String, Double> now, Map<String, Double> before) {
        Double n = now.get(f.key());
        Double b = before.get(f.key());
        java.math.BigDecimal d = f.difference(n, b);
        String judged = d == null ? "" : f.better().judge(d);
        return (f == Figures.SCORE ? "score" : f.label()) + ": " + f.text(b) + " → " + f.text(n)
                + (judged.isEmpty() ? "" : ", " + judged);
    }

    private void sideBySide() {
        List<SetResult> cols = a.columns();
        List<Map<String, Double>> values = cols.stream().map(Headline::of).toList();
        List<String> header = new ArrayList<>();
        header.add("figure");
        cols.forEach(
                c -> header.add(c.name() + " (" + FigureFormat.count(c.routes().size(), "route") + ")"));
        List<List<String>> rows = new ArrayList<>();
        for (Figure k : Figures.HEADLINE) {
            List<String> row = new ArrayList<>();
            row.add(k.label());
            values.forEach(v -> row.add(k.text(v.get(k.key()))));
            rows.add(row);
        }
        float[] widths = new float[header.size()];
        widths[0] = 3.2f;
        for (int i = 1; i < widths.length; i++) {
            widths[i] = 1.6f;
        }
        doc.table(header, rows, widths);
    }

    private void grips() {
        GripStatistics g = a.audited().figures().grip();
        doc.heading("Grip directions", false);
        if (g.n() == 0) {
            doc.paragraph("No hand hold with a grip direction is recorded"
                    + (g.undirected() > 0 ? " (" + g.undirected() + " hand holds have none)." : "."));
            return;
        }
        doc.drawing(300, 250, (gr, size) -> Drawings.rose(gr, size[0], size[1], g, doc.fonts()));
        doc.paragraph(g.n() + " hand grips (" + g.undirected() + " hand holds without a direction). Resultant "
                + "length " + Figures.GRIP_RESULTANT.text(g.resultantLength()) + " (0 spread, 1 all one way); "
                + "circular standard deviation " + Figures.GRIP_SD.text(g.circularSdDeg()) + "°; "
                + "sector entropy " + Figures.GRIP_SECTOR_ENTROPY.text(g.sectorEntropy()) + "; edges horizontal "
                + FigureFormat.percent(g.horizontalEdgeShare()) + ", vertical "
                + FigureFormat.percent(g.verticalEdgeShare()) + "; Rayleigh test p "
                + Figures.GRIP_RAYLEIGH_P.text(g.rayleighP())
                + ". Gravity favours up-facing holds, so a small p is expected on most walls and is no finding on "
                + "its own.");
    }

    private void holds() {
        SetFigures f = a.audited().figures();
        doc.heading("Holds", false);
        if (f.holds().n() == 0) {
            doc.paragraph("No hold placements are recorded.");
            return;
        }
        doc.chart(Charts.bars(doc.fonts(), "placements", sortedCounts(f.holds()), false), doc.width(), 150);
        doc.paragraph("Hold types: " + summary(f.holds(), Figures.HOLDS) + ".");
        if (f.sizes().n() > 0) {
            Map<String, Long> sizes = new LinkedHashMap<>();
            for (String s : List.of("xs", "s", "m", "l", "xl")) {
                sizes.put(s, f.sizes().counts().getOrDefault(s, 0L));
            }
            doc.chart(Charts.bars(doc.fonts(), "placements", sizes, false), doc.width() * 0.6f, 110);
            doc.paragraph("Sizes: " + summary(f.sizes(), Figures.SIZES)
                    + (f.sizes().missing() > 0 ? "; " + f.sizes().missing() + " placements without a size" : "") + ".");
        }
    }

    private void grades() {
        doc.heading("Grades against the target", false);
        SetResult reference = a.subject().kind() == Subject.Kind.GYM_STANDING ? a.audited() : a.reference();
        for (Discipline d : Discipline.values()) {
            GradeFigures mine = a.audited().figures().grades().get(d);
            if (mine == null) {
                continue;
            }
            doc.caption(d.word() + " routes of this set", 160);
            grade(mine, d);
            GradeFigures ref = reference == null || reference == a.audited()
                    ? null
                    : reference.figures().grades().get(d);
            if (ref != null) {
                doc.caption(
                        d.word() + " routes of the " + reference.name() + " (what the score's grades part measures)",
                        160);
                grade(ref, d);
            }
        }
    }

    private void grade(GradeFigures g, Discipline d) {
        if (g.target() == null) {
            Map<String, Long> h = new LinkedHashMap<>();
            g.histogram().forEach((k, v) -> {
                if (v > 0) {
                    h.put(k, v);
                }
            });
            doc.chart(Charts.bars(doc.fonts(), "routes", h, false), doc.width() * 0.7f, 110);
            doc.paragraph(DocumentWords.withRemedy(
                    "No target for " + d.word() + " routes.",
                    Remedy.of(Remedy.Kind.SET_TARGET, "discipline", d.word())));
            return;
        }
        long inside = g.target().keySet().stream()
                .mapToLong(b -> g.histogram().getOrDefault(b, 0L))
                .sum();
        Map<String, Double> observed = new LinkedHashMap<>();
        g.target()
                .keySet()
                .forEach(b -> observed.put(b, inside == 0 ? 0 : g.histogram().getOrDefault(b, 0L) / (double) inside));
        doc.chart(Charts.barsAgainstTarget(doc.fonts(), observed, g.target()), doc.width(), 140);
        boolean example = a.settings().targetIsDefault(d);
        doc.paragraph("Distance to target " + Figures.GRADES_DISTANCE.text(g.emdToTarget()) + " bands "
                + "(Wasserstein-1); chi-square " + Figures.GRADES_CHI_SQUARE.text(g.chiSquare()) + " on "
                + (g.chiSquareDf() == null ? FigureFormat.NONE : g.chiSquareDf()) + " df, p "
                + Figures.GRADES_CHI_SQUARE_P.text(g.chiSquareP())
                + (Boolean.FALSE.equals(g.chiSquareReliable())
                        ? " (too few routes for the test to be reliable: Cochran's rule)"
                        : "")
                + (g.gaps().isEmpty() ? "" : "; no route in " + String.join(", ", g.gaps()))
                + (g.outsideTarget() > 0
                        ? "; " + FigureFormat.count(g.outsideTarget(), "route") + " outside the target's bands"
                        : "")
                + "."
                + (example
                        ? " The target is an example pyramid (common practice), not the gym's own: a heuristic to "
                                + "replace: "
                                + DocumentWords.remedy(Remedy.of(Remedy.Kind.SET_TARGET, "discipline", d.word())) + "."
                        : ""));
    }

    private void moves() {
        SetFigures f = a.audited().figures();
        doc.heading("Moves and styles", false);
        if (f.moves().n() > 0) {
            doc.chart(Charts.bars(doc.fonts(), "times listed", sortedCounts(f.moves()), false), doc.width(), 140);
        }
        doc.paragraph("Moves: " + summary(f.moves(), Figures.MOVES) + ". Styles: " + summary(f.styles(), Figures.STYLES)
                + ".");
    }

    private void profiles() {
        SetFigures f = a.audited().figures();
        doc.heading("Difficulty profiles", false);
        Map<String, Long> c = new LinkedHashMap<>();
        f.profiles().counts().forEach((k, v) -> c.put(k.key().replace('_', ' '), v));
        doc.chart(Charts.bars(doc.fonts(), "routes", c, false), doc.width() * 0.7f, 110);
        doc.paragraph(
                "Split entropy " + Figures.PROFILE_SPREAD.text(f.profiles().splitEntropy()) + " (0: every "
                        + "classified route alike; 1: an even spread over steady, sustained, single crux and multi crux). "
                        + f.profiles().counts().get(ProfileClass.UNCLASSIFIED) + " routes have fewer than three move "
                        + "difficulties and are unclassified.");
    }

    private void repetition() {
        SetResult s = a.audited();
        RepetitionFigures r = s.repetition();
        doc.heading("Repetition", false);
        if (r == null) {
            doc.paragraph("Not measured.");
            return;
        }
        doc.paragraph("Novelty " + Figures.NOVELTY.text(r.novelty())
                + (r.novelty() == null ? " (" + s.undefined().getOrDefault("novelty", "") + ")" : "") + "; hold reuse "
                + FigureFormat.percent(s.holdReuseRate()) + "; compared with "
                + FigureFormat.count(s.windowRoutes(), "route") + " of the look-back "
                + "window; near-repeat threshold "
                + a.settings().nearRepeatThreshold().toPlainString() + ".");
        pairs("Near-repeats of earlier routes", r.nearRepeats());
        pairs("Near-repeats inside this set", r.internalRepeats());
        if (!r.setAside().isEmpty()) {
            doc.paragraph(
                    (r.setAside().size() == 1 ? "1 pair looks" : r.setAside().size() + " pairs look")
                            + " alike by hold types, directions and moves but "
                            + (r.setAside().size() == 1 ? "is" : "are")
                            + " set aside: different hold shapes or places, "
                            + "or another grade band and sequence (listed in the JSON).");
        }
        if (!r.notEnoughDetail().isEmpty()) {
            doc.paragraph("Too little detail to compare (fewer than four hold and move features): "
                    + FeatureText.list(r.notEnoughDetail(), 8) + ".");
        }
    }

    private void pairs(String title, List<RepetitionFigures.Pair> pairs) {
        doc.paragraph(title + (pairs.isEmpty() ? ": none." : ""), PdfDoc.BODY, true, Palette.INK);
        if (pairs.isEmpty()) {
            return;
        }
        List<List<String>> rows = new ArrayList<>();
        for (RepetitionFigures.Pair p : pairs) {
            rows.add(List.of(
                    p.route(),
                    p.other(),
                    Figures.JACCARD.text(p.similarity().jaccard()),
                    p.evidence().words()));
        }
        doc.table(List.of("route", "repeats", "Jaccard", "evidence"), rows, new float[] {2.2f, 2.2f, 0.8f, 4.5f});
    }

    private void lines() {
        SetFigures f = a.audited().figures();
        doc.heading("Route lines and reach", false);
        doc.paragraph("Geometric index of entropy (0 straight, larger wandering): mean "
                + Figures.GIE_MEAN.text(f.line().gieMean()) + " over "
                + FigureFormat.count(f.line().withGie(), "route") + "; "
                + RouteLine.ADAPTATION + ". A span longer than "
                + Figures.REACH_FACTOR.text(f.line().reachK()) + " × "
                + Figures.REACH_HEIGHT.text(f.line().reachHeightM())
                + " m is flagged: a heuristic (arm span is close to height in most adults), not a measurement of any "
                + "climber.");
        List<List<String>> rows = new ArrayList<>();
        for (RouteLineFigures r : f.line().routes()) {
            rows.add(List.of(
                    r.route(),
                    String.valueOf(r.handHolds()),
                    Figures.PATH_LENGTH.text(r.pathLength()),
                    Figures.GIE.text(r.gie()),
                    r.longSpans().isEmpty() ? "" : r.longSpans().size() + " long"));
        }
        doc.table(List.of("route", "hand holds", "path (m)", "GIE", "spans flagged"), rows, new float[] {
            3.5f, 1, 1, 1, 1.3f
        });
        List<RouteLineFigures> drawn = f.line().routes().stream()
                .filter(r -> r.points().size() >= 2)
                .limit(8)
                .toList();
        if (!drawn.isEmpty()) {
            float cell = Math.min(120, doc.width() / Math.min(4, drawn.size()));
            int perRow = (int) (doc.width() / cell);
            for (int i = 0; i < drawn.size(); i += perRow) {
                List<RouteLineFigures> row = drawn.subList(i, Math.min(drawn.size(), i + perRow));
                // A tall route (a rope route, 15 m of wall for 2 m across) gets a taller cell, so its holds do not
                // crowd into a square: up to two and a half cells high.
                float high = (float) Math.min(
                        2.5 * cell,
                        Math.max(
                                cell,
                                row.stream()
                                        .mapToDouble(r -> cell * Drawings.aspect(r.points()))
                                        .max()
                                        .orElse(cell)));
                doc.drawing(doc.width(), high + 12, (g, size) -> {
                    for (int k = 0; k < row.size(); k++) {
                        java.awt.Graphics2D sub = (java.awt.Graphics2D) g.create();
                        sub.translate(k * cell, 0);
                        Drawings.line(
                                sub,
                                cell - 8,
                                high - 4,
                                row.get(k).points(),
                                row.get(k).longSpans(),
                                doc.fonts());
                        sub.setColor(Palette.INK);
                        sub.setFont(doc.fonts().awt(6.5f, false));
                        sub.drawString(row.get(k).route(), 0, high + 8);
                        sub.dispose();
                    }
                });
            }
        }
    }

    private void settings() {
        doc.heading("Settings used", false);
        doc.paragraph("Look-back " + a.settings().lookbackDays() + " days; near-repeat threshold "
                + a.settings().nearRepeatThreshold().toPlainString() + "; reach "
                + Figures.REACH_FACTOR.text(a.settings().reachFactor()) + " × "
                + Figures.REACH_HEIGHT.text(a.settings().reachHeightM())
                + " m; score weights "
                + String.join(
                        ", ",
                        a.settings().scoreWeights().entrySet().stream()
                                .map(e -> e.getKey() + " " + FigureFormat.round(e.getValue(), 2))
                                .toList())
                + ".");
        doc.paragraph(
                "Heuristics in this document: the composite score, the reach flags, the default grade pyramid "
                        + "(where the gym has not set its own target) and the thresholds behind the findings. The figures "
                        + "themselves follow published methods: Shannon entropy, Hill numbers, the Rayleigh test, the "
                        + "Wasserstein distance, Pearson's chi-square and the Jaccard index.",
                7.5f,
                false,
                Palette.MUTED);
    }

    private static Map<String, Long> sortedCounts(VarietyFigures v) {
        Map<String, Long> out = new LinkedHashMap<>();
        v.counts().entrySet().stream()
                .sorted(Map.Entry.<String, Long>comparingByValue().reversed().thenComparing(Map.Entry.comparingByKey()))
                .limit(14)
                .forEach(e -> out.put(e.getKey(), e.getValue()));
        return out;
    }

    private static String summary(VarietyFigures v, Figures.Variety c) {
        if (v.n() == 0) {
            return "none recorded";
        }
        return v.richness() + " kinds in " + v.n() + "; effective number (Hill N1) "
                + c.hillN1().text(v.hillN1())
                + (v.coverage() == null ? "" : ", coverage " + c.coverage().text(v.coverage()));
    }
}
