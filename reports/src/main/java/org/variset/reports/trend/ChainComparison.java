package org.variset.reports.trend;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.variset.reports.catalogue.Figure;
import org.variset.reports.catalogue.Figures;

/**
 * Several gyms' trends over one period, side by side: what a chain's manager compares. Each row is read from one
 * gym's {@link Trend}; nothing is computed across gyms except the order (by name), so a figure means in the row what
 * it means in that gym's own report.
 *
 * @param from the first day
 * @param to the last day
 * @param rows one row per gym, by name
 */
public record ChainComparison(LocalDate from, LocalDate to, List<Row> rows) {

    /**
     * One gym.
     *
     * @param gym the gym
     * @param routesSet routes set in the period
     * @param resets resets in the period
     * @param meanResetScore the mean composite score of its scored resets, or null
     * @param routesUp routes up on the period's last month-end point
     * @param figures the gym's headline figures at that point ({@link Figures#TREND}), null where undefined
     * @param walls its walls
     * @param wallsDue walls due for a reset on the status day
     * @param wallsOverdue walls overdue on the status day
     * @param medianLifetimeDays the median days up of routes stripped in the period, or null
     * @param nearRepeats near-repeats found in the period
     */
    public record Row(
            String gym,
            int routesSet,
            int resets,
            Double meanResetScore,
            int routesUp,
            Map<String, Double> figures,
            int walls,
            int wallsDue,
            int wallsOverdue,
            Double medianLifetimeDays,
            int nearRepeats) {}

    /**
     * Compares trends of one period.
     *
     * @throws IllegalArgumentException when they are not of the same period
     */
    public static ChainComparison of(List<Trend> trends) {
        if (trends.isEmpty()) {
            throw new IllegalArgumentException("no gym to compare");
        }
        LocalDate from = trends.get(0).from();
        LocalDate to = trends.get(0).to();
        List<Row> rows = new ArrayList<>();
        for (Trend t : trends) {
            if (!t.from().equals(from) || !t.to().equals(to)) {
                throw new IllegalArgumentException("the trends cover different periods (" + t.gym() + ": " + t.from()
                        + " to " + t.to() + ", not " + from + " to " + to + ")");
            }
            rows.add(row(t));
        }
        rows.sort(java.util.Comparator.comparing(Row::gym));
        return new ChainComparison(from, to, List.copyOf(rows));
    }

    private static Row row(Trend t) {
        Trend.MonthPoint last = null;
        for (Trend.MonthPoint p : t.months()) {
            if (p.scope().equals("gym")) {
                last = p;
            }
        }
        Map<String, Double> figures = new LinkedHashMap<>();
        for (Figure k : Figures.TREND) {
            figures.put(k.key(), last == null ? null : last.figures().get(k.key()));
        }
        int resets = t.walls().stream().mapToInt(w -> w.resets().size()).sum();
        int due = (int) t.walls().stream().filter(w -> w.status().equals("due")).count();
        int overdue = (int)
                t.walls().stream().filter(w -> w.status().equals("overdue")).count();
        return new Row(
                t.gym(),
                t.routesSet(),
                resets,
                t.meanResetScore(),
                last == null ? 0 : last.routes(),
                figures,
                t.walls().size(),
                due,
                overdue,
                t.lifetime().medianDays(),
                t.repeats().size());
    }
}
