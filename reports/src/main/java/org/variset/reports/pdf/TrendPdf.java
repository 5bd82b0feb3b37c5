package org.variset.reports.pdf;

import java.io.OutputStream;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.variset.archive.grade.Discipline;
import org.variset.reports.catalogue.Figure;
import org.variset.reports.catalogue.Figures;
import org.variset.reports.format.FigureFormat;
import org.variset.reports.scoring.grades.GradeFigures;
import org.variset.reports.trend.ChainComparison;
import org.variset.reports.trend.Trend;

/**
 * The trend report as a PDF, what a manager takes to the owners: the walls and how long each has been up against its
 * cycle, the month-end trend lines of the main figures, the period's grades against the target, the setter mix and the
 * period's notable repeats.
 */
public final class TrendPdf {
    private TrendPdf() {}

    /**
     * Writes the report.
     *
     * @return characters no font could print
     */
    public static Set<String> write(Trend t, PdfOptions options, OutputStream out) {
        boolean year = t.from().getDayOfYear() == 1
                && t.to().equals(t.from().withDayOfYear(t.from().lengthOfYear()));
        String title = year ? "Annual report " + t.from().getYear() : "Trend report";
        try (PdfDoc doc = new PdfDoc(out, options, title, t.gym() + " · " + t.from() + " to " + t.to())) {
            if (t.stopsAtToday()) {
                doc.paragraph(t.stopsAtTodayWords());
            }
            walls(doc, t);
            repeats(doc, t);
            doc.safety();
            trends(doc, t);
            grades(doc, t);
            setters(doc, t);
            return Set.copyOf(doc.missingCharacters());
        }
    }

    /**
     * Writes a chain's report: the gyms side by side with their month-end scores on one chart, then each gym's own
     * sections.
     *
     * @return characters no font could print
     */
    public static Set<String> write(ChainComparison c, List<Trend> trends, PdfOptions options, OutputStream out) {
        boolean year = c.from().getDayOfYear() == 1
                && c.to().equals(c.from().withDayOfYear(c.from().lengthOfYear()));
        String title = (year ? "Chain report " + c.from().getYear() : "Chain trend report");
        try (PdfDoc doc = new PdfDoc(out, options, title, c.rows().size() + " gyms · " + c.from() + " to " + c.to())) {
            sideBySide(doc, c);
            doc.paragraph(
                    "Score: the composite score at the last month end. Grip sprd: grip-direction spread (sector"
                            + " entropy). Up share: share of hand grips facing up. Hold types: effective number of hold types. "
                            + "Moves cov: share of the move vocabulary used. Grade dist: bands from the grade target.",
                    7.5f,
                    false,
                    Palette.MUTED);
            doc.paragraph("Set: routes set in the period. Mean score: of its resets. Up: routes up at the last month "
                    + "end, where the figures are taken. Overdue: walls past their reset cycle of all walls. Each "
                    + "figure means what it means in the gym's own report; scores and thresholds are heuristics.");
            Map<String, Map<LocalDate, Double>> score = new LinkedHashMap<>();
            for (Trend t : trends) {
                Map<LocalDate, Double> line = score.computeIfAbsent(t.gym(), k -> new LinkedHashMap<>());
                t.months().stream()
                        .filter(p -> p.scope().equals("gym"))
                        .forEach(p -> line.put(p.day(), p.figures().get(Figures.SCORE.key())));
            }
            doc.caption("Month-end score of each gym's routes up (a heuristic, without novelty here)", 200);
            doc.chart(Charts.lines(doc.fonts(), "score", score), doc.width(), 200);
            doc.safety();
            for (Trend t : trends) {
                doc.heading(t.gym(), true);
                walls(doc, t);
                repeats(doc, t);
                trends(doc, t);
                grades(doc, t);
                setters(doc, t);
            }
            return Set.copyOf(doc.missingCharacters());
        }
    }

    /** The gyms' rows, one per gym. */
    private static void sideBySide(PdfDoc doc, ChainComparison c) {
        doc.heading("Gyms side by side", false);
        List<List<String>> rows = new ArrayList<>();
        for (ChainComparison.Row r : c.rows()) {
            List<String> row = new ArrayList<>(List.of(
                    r.gym(),
                    String.valueOf(r.routesSet()),
                    String.valueOf(r.resets()),
                    Figures.SCORE.text(r.meanResetScore()),
                    String.valueOf(r.routesUp())));
            Figures.TREND.forEach(k -> row.add(k.text(r.figures().get(k.key()))));
            row.add(r.wallsOverdue() + "/" + r.walls());
            row.add(String.valueOf(r.nearRepeats()));
            rows.add(row);
        }
        List<String> header = new ArrayList<>(List.of("gym", "set", "resets", "mean score", "up"));
        Figures.TREND.forEach(k -> header.add(k.shortLabel()));
        header.add("overdue");
        header.add("repeats");
        doc.table(header, rows, new float[] {
            2.2f, 0.75f, 1.05f, 0.95f, 0.7f, 0.9f, 0.9f, 0.95f, 1.05f, 1.15f, 1.05f, 1.35f, 1.35f
        });
    }

    private static void walls(PdfDoc doc, Trend t) {
        doc.heading("Walls (status on " + t.asOf() + ")", false);
        List<List<String>> rows = new ArrayList<>();
        for (Trend.WallStatus w : t.walls()) {
            rows.add(List.of(
                    w.wall(),
                    String.valueOf(w.resets().size()),
                    Figures.SCORE.text(w.meanScore()),
                    w.lastReset() == null ? FigureFormat.NONE : w.lastReset().toString(),
                    w.daysSince() == null ? FigureFormat.NONE : w.daysSince().toString(),
                    String.valueOf(w.cycleDays()),
                    w.status(),
                    w.daysPastDue() == null
                            ? FigureFormat.NONE
                            : w.daysPastDue().toString()));
        }
        doc.table(
                List.of("wall", "resets", "mean score", "last reset", "days up", "cycle", "status", "days past due"),
                rows,
                new float[] {2.2f, 1, 1.1f, 1.6f, 1, 1, 1.2f, 1.2f});
        Trend.Lifetime l = t.lifetime();
        doc.paragraph(l.stripped() + " routes came down in the period after a median of "
                + (Figures.LIFETIME.text(l.medianDays())) + " days up; "
                + l.stillUp() + " were up "
                + "on " + t.asOf() + ". A wall is due after its cycle and overdue "
                + (t.walls().isEmpty() ? 14 : t.walls().get(0).overdueAfterDays())
                + " days later (common practice: boulders due at four "
                + "weeks and overdue at six, rope routes at eight and ten). The mean score is a heuristic.");
    }

    private static void repeats(PdfDoc doc, Trend t) {
        doc.heading("Notable repeats", false);
        if (t.repeats().isEmpty()) {
            doc.paragraph("No near-repeat among the period's resets.");
            return;
        }
        List<List<String>> rows = new ArrayList<>();
        t.repeats().stream()
                .limit(12)
                .forEach(r -> rows.add(List.of(
                        r.pair().route(),
                        r.pair().other(),
                        Figures.JACCARD.text(r.pair().similarity().jaccard()))));
        doc.table(List.of("route", "repeats", "Jaccard"), rows, new float[] {3, 3, 1});
        if (t.repeats().size() > 12) {
            doc.paragraph((t.repeats().size() - 12) + " more in the trend's JSON form.");
        }
    }

    private static void trends(PdfDoc doc, Trend t) {
        doc.heading("Month-end figures of the gym's routes up", true);
        Map<String, Map<LocalDate, Double>> score = new LinkedHashMap<>();
        Map<String, Map<LocalDate, Double>> variety = new LinkedHashMap<>();
        Map<String, Map<LocalDate, Double>> grades = new LinkedHashMap<>();
        List<Figure> followed =
                List.of(Figures.GRIP_SECTOR_ENTROPY, Figures.HOLDS.coverage(), Figures.MOVES.coverage());
        for (Figure k : followed) {
            variety.put(k.label(), new LinkedHashMap<>());
        }
        for (Trend.MonthPoint p : t.months()) {
            score.computeIfAbsent(p.scope().equals("gym") ? "whole gym" : p.scope(), k -> new LinkedHashMap<>())
                    .put(p.day(), p.figures().get(Figures.SCORE.key()));
            if (p.scope().equals("gym")) {
                for (Figure k : followed) {
                    variety.get(k.label()).put(p.day(), p.figures().get(k.key()));
                }
                grades.computeIfAbsent("bands from target", k -> new LinkedHashMap<>())
                        .put(p.day(), p.figures().get(Figures.GRADES_DISTANCE.key()));
            }
        }
        doc.caption("Score of the whole gym and of each wall (a heuristic, without novelty here)", 215);
        doc.paragraph("A wall's line is its own score: it leaves out the grades part, which is the gym's (its routes "
                + "up against the target), so it moves only when the wall's own routes change.");
        doc.chart(Charts.lines(doc.fonts(), "score", score), doc.width(), 190);
        doc.caption("Variety of the whole gym (0 to 1)", 170);
        doc.chart(Charts.lines(doc.fonts(), "value", variety), doc.width(), 170);
        doc.caption("Grades of the whole gym: distance to the target in bands (0 on target)", 130);
        doc.chart(Charts.lines(doc.fonts(), "bands", grades), doc.width(), 130);
        List<String> gaps = t.gymGaps().stream()
                .map(p -> p.day() + ": no " + p.gapWords(", "))
                .toList();
        doc.paragraph(
                gaps.isEmpty()
                        ? "No grade gap at any month end (a band the target expects two or more routes "
                                + "in, with none)."
                        : "Grade gaps at month ends (bands the target expects two or more routes in, " + "with none): "
                                + String.join("; ", gaps) + ".");
    }

    private static void grades(PdfDoc doc, Trend t) {
        doc.heading("Grades of the routes set in the period", true);
        for (Map.Entry<Discipline, GradeFigures> e : t.grades().entrySet()) {
            GradeFigures g = e.getValue();
            doc.caption(e.getKey().word() + " routes", 130);
            if (g.target() == null) {
                Map<String, Long> h = new LinkedHashMap<>();
                g.histogram().forEach((k, v) -> {
                    if (v > 0) {
                        h.put(k, v);
                    }
                });
                doc.chart(Charts.bars(doc.fonts(), "routes", h, false), doc.width() * 0.7f, 120);
                doc.paragraph("No target for " + e.getKey().word() + " routes.");
                continue;
            }
            long inside = g.target().keySet().stream()
                    .mapToLong(b -> g.histogram().getOrDefault(b, 0L))
                    .sum();
            Map<String, Double> observed = new LinkedHashMap<>();
            g.target()
                    .keySet()
                    .forEach(b ->
                            observed.put(b, inside == 0 ? 0 : g.histogram().getOrDefault(b, 0L) / (double) inside));
            doc.chart(Charts.barsAgainstTarget(doc.fonts(), observed, g.target()), doc.width(), 140);
            doc.paragraph("Distance to target " + Figures.GRADES_DISTANCE.text(g.emdToTarget()) + " bands"
                    + (Boolean.TRUE.equals(t.targetIsExample().get(e.getKey()))
                            ? "; the target is an example "
                                    + "pyramid (common practice, a heuristic), not the gym's own"
                            : "")
                    + ".");
        }
    }

    private static void setters(PdfDoc doc, Trend t) {
        doc.heading("Setters", false);
        List<List<String>> rows = new ArrayList<>();
        for (Trend.SetterProfile s : t.setters()) {
            rows.add(List.of(
                    s.setter(),
                    String.valueOf(s.routes()),
                    FigureFormat.percent(s.share()),
                    top(s.gripShares()),
                    top(s.holdShares()),
                    top(s.moveShares())));
        }
        doc.table(List.of("setter", "routes", "share", "grips face", "holds", "moves"), rows, new float[] {
            2, 0.8f, 0.8f, 2.4f, 2.4f, 2.4f
        });
        doc.paragraph(
                "A route set by two setters counts for both. Shares: of each setter's hand grips, placements "
                        + "and routes.",
                7.5f,
                false,
                Palette.MUTED);
    }

    private static String top(Map<String, Double> shares) {
        return String.join(
                ", ",
                shares.entrySet().stream()
                        .filter(e -> e.getValue() > 0)
                        .sorted(Map.Entry.<String, Double>comparingByValue().reversed())
                        .limit(3)
                        .map(e -> e.getKey() + " " + FigureFormat.percent(e.getValue()))
                        .toList());
    }
}
