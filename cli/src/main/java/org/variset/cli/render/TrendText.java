package org.variset.cli.render;

import java.util.List;
import java.util.Map;
import java.util.stream.Collectors;
import org.variset.archive.grade.Discipline;
import org.variset.reports.catalogue.Figures;
import org.variset.reports.format.FigureFormat;
import org.variset.reports.scoring.grades.GradeFigures;
import org.variset.reports.trend.ChainComparison;
import org.variset.reports.trend.Trend;

/** A trend as text for people. */
public final class TrendText {

    private TrendText() {}

    /** The trend as text. */
    public static String of(Trend t) {
        StringBuilder b = new StringBuilder();
        b.append("Trends of ")
                .append(t.gym())
                .append(", ")
                .append(t.from())
                .append(" to ")
                .append(t.to())
                .append("\n\n");
        if (t.stopsAtToday()) {
            b.append(t.stopsAtTodayWords()).append("\n\n");
        }
        months(b, t);
        walls(b, t);
        lifetimeAndSetters(b, t);
        gradesAndRepeats(b, t);
        return b.toString();
    }

    /** The month-end figures of the gym, with its grade gaps. */
    private static void months(StringBuilder b, Trend t) {
        b.append("Month-end figures of the gym's routes up (score is a heuristic; novelty is not part of it here)\n");
        b.append(String.format("  %-10s %6s", "day", "routes"));
        Figures.TREND.forEach(k -> b.append(String.format(" %10s", k.shortLabel())));
        b.append('\n');
        for (Trend.MonthPoint p : t.months()) {
            if (!p.scope().equals("gym")) {
                continue;
            }
            b.append(String.format("  %-10s %6d", p.day(), p.routes()));
            Figures.TREND.forEach(k ->
                    b.append(String.format(" %10s", k.text(p.figures().get(k.key())))));
            b.append('\n');
        }
        List<String> gaps =
                t.gymGaps().stream().map(p -> p.day() + ": " + p.gapWords(", ")).toList();
        b.append(
                gaps.isEmpty()
                        ? ""
                        : "  Grade gaps (bands the target expects two or more routes in, with none): "
                                + String.join(" · ", gaps) + "\n");
    }

    /** Each wall's resets and status. */
    private static void walls(StringBuilder b, Trend t) {
        b.append("\nWalls (status on ").append(t.asOf()).append(")\n");
        for (Trend.WallStatus w : t.walls()) {
            b.append("  ")
                    .append(w.wall())
                    .append(": ")
                    .append(w.resets().size())
                    .append(w.resets().size() == 1 ? " reset" : " resets")
                    .append(", mean score ")
                    .append(Figures.SCORE.text(w.meanScore()))
                    .append("; ")
                    .append(
                            w.lastReset() == null
                                    ? "never reset"
                                    : "last reset " + w.lastReset() + ", " + w.daysSince() + " days ago, cycle "
                                            + w.cycleDays() + " days: " + w.status()
                                            + (w.daysPastDue() > 0 ? " (" + w.daysPastDue() + " days past due)" : ""))
                    .append('\n');
        }
    }

    /** Route lifetimes and the setter mix. */
    private static void lifetimeAndSetters(StringBuilder b, Trend t) {
        Trend.Lifetime l = t.lifetime();
        b.append("\nRoute lifetime: ")
                .append(l.stripped())
                .append(" routes came down in the period, median ")
                .append(Figures.LIFETIME.text(l.medianDays()))
                .append(" days up; ")
                .append(l.stillUp())
                .append(" up on ")
                .append(t.asOf())
                .append(".\n");
        b.append("\nSetters (a route set by two setters counts for both)\n");
        for (Trend.SetterProfile s : t.setters()) {
            b.append("  ")
                    .append(s.setter())
                    .append(": ")
                    .append(s.routes())
                    .append(" routes (")
                    .append(FigureFormat.percent(s.share()))
                    .append("); grips ")
                    .append(top(s.gripShares(), 3))
                    .append("; holds ")
                    .append(top(s.holdShares(), 3))
                    .append("; moves ")
                    .append(top(s.moveShares(), 3))
                    .append('\n');
        }
    }

    /** The period's grades against the target, and its near-repeats. */
    private static void gradesAndRepeats(StringBuilder b, Trend t) {
        for (Map.Entry<Discipline, GradeFigures> e : t.grades().entrySet()) {
            GradeFigures g = e.getValue();
            b.append("\nGrades of the ")
                    .append(e.getKey().word())
                    .append(" routes set in the period: ")
                    .append(g.histogram().entrySet().stream()
                            .filter(x -> x.getValue() > 0)
                            .map(x -> x.getKey() + " " + x.getValue())
                            .collect(Collectors.joining(", ")))
                    .append(
                            g.emdToTarget() == null
                                    ? "; no target"
                                    : "; " + Figures.GRADES_DISTANCE.text(g.emdToTarget())
                                            + " bands from the target"
                                            + (t.targetIsExample().get(e.getKey()) ? " (the example pyramid)" : ""))
                    .append('\n');
        }
        b.append("\nNotable repeats: ")
                .append(t.repeats().isEmpty() ? "none" : t.repeats().size())
                .append('\n');
        t.repeats().stream()
                .limit(10)
                .forEach(r -> b.append("  ")
                        .append(r.pair().route())
                        .append(" repeats ")
                        .append(r.pair().other())
                        .append(" (Jaccard ")
                        .append(Figures.JACCARD.text(r.pair().similarity().jaccard()))
                        .append(")\n"));
    }

    /** Several gyms side by side, then each gym's own trend. */
    public static String of(ChainComparison c, List<Trend> trends) {
        StringBuilder b = new StringBuilder();
        b.append("Gyms compared, ")
                .append(c.from())
                .append(" to ")
                .append(c.to())
                .append(" (")
                .append(c.rows().size())
                .append(" gyms)\n\n");
        b.append(String.format("  %-24s %6s %6s %6s %6s", "gym", "set", "resets", "mean", "up"));
        Figures.TREND.forEach(k -> b.append(String.format(" %10s", k.shortLabel())));
        b.append(String.format(" %7s %7s %8s %7s%n", "due", "overdue", "lifetime", "repeats"));
        for (ChainComparison.Row r : c.rows()) {
            b.append(String.format(
                    "  %-24s %6d %6d %6s %6d",
                    clip(r.gym(), 24),
                    r.routesSet(),
                    r.resets(),
                    Figures.SCORE.text(r.meanResetScore()),
                    r.routesUp()));
            Figures.TREND.forEach(k ->
                    b.append(String.format(" %10s", k.text(r.figures().get(k.key())))));
            b.append(String.format(
                    " %7s %7s %8s %7d%n",
                    r.wallsDue() + "/" + r.walls(),
                    r.wallsOverdue() + "/" + r.walls(),
                    Figures.LIFETIME.text(r.medianLifetimeDays()),
                    r.nearRepeats()));
        }
        b.append("\n  set: routes set in the period; mean: mean score of its resets; up: routes up at the last month "
                + "end, where the figures are taken; due, overdue: walls of all walls; lifetime: median days up of "
                + "the routes that came down. Scores and thresholds are heuristics.\n");
        for (Trend t : trends) {
            b.append("\n").append("=".repeat(78)).append("\n").append(of(t));
        }
        return b.toString();
    }

    private static String clip(String s, int n) {
        return s.length() <= n ? s : s.substring(0, n - 1) + "…";
    }

    /** The largest shares: {@code up 62%, right 12%}. */
    static String top(Map<String, Double> shares, int n) {
        if (shares.values().stream().allMatch(v -> v == 0)) {
            return FigureFormat.NONE;
        }
        return shares.entrySet().stream()
                .filter(e -> e.getValue() > 0)
                .sorted(Map.Entry.<String, Double>comparingByValue().reversed())
                .limit(n)
                .map(e -> e.getKey() + " " + FigureFormat.percent(e.getValue()))
                .collect(Collectors.joining(", "));
    }
}
