package org.variset.reports.trend;

import java.time.LocalDate;
import java.util.List;
import java.util.Map;
import org.variset.archive.grade.Discipline;
import org.variset.reports.scoring.grades.GradeFigures;
import org.variset.reports.scoring.repetition.RepetitionFigures;

/**
 * The trends of one gym over a period.
 *
 * @param gym the gym
 * @param from the first day
 * @param to the last day
 * @param asOf the day wall status is reckoned on: the period's end, or today when that is earlier
 * @param months the month-end points, gym first then each wall, month by month
 * @param walls each wall's resets and status
 * @param lifetime route lifetimes
 * @param setters the setter mix, most routes first
 * @param grades the grades of the routes set in the period, against the target, per discipline
 * @param targetIsExample per discipline, true when the target is the example pyramid
 * @param repeats the period's near-repeats: each reset's routes against its look-back window
 * @param routesSet routes set in the period
 * @param meanResetScore the mean composite score of the period's scored resets, or null without any
 */
public record Trend(
        String gym,
        LocalDate from,
        LocalDate to,
        LocalDate asOf,
        List<MonthPoint> months,
        List<WallStatus> walls,
        Lifetime lifetime,
        List<SetterProfile> setters,
        Map<Discipline, GradeFigures> grades,
        Map<Discipline, Boolean> targetIsExample,
        List<Repeat> repeats,
        int routesSet,
        Double meanResetScore) {
    /** True when the period reaches past today: its figures stop at {@link #asOf}. */
    public boolean stopsAtToday() {
        return asOf.isBefore(to);
    }

    /** "" or, when the period reaches past today, the sentence that says its figures stop there. */
    public String stopsAtTodayWords() {
        return stopsAtToday()
                ? "The period runs to " + to + ", which has not come yet: its figures stop at today, " + asOf + "."
                : "";
    }

    /**
     * The standing set of the gym or one wall on a month's last day (or the period's last day).
     *
     * @param day the day
     * @param scope {@code gym}, or the wall's name
     * @param routes routes up that day
     * @param figures the headline figures ({@link org.variset.reports.audit.Headline} keys)
     * @param gradeGaps the notable grade gaps per discipline word, empty when none
     *     ({@link org.variset.reports.figures.GradeGaps})
     */
    public record MonthPoint(
            LocalDate day, String scope, int routes, Map<String, Double> figures, Map<String, List<String>> gradeGaps) {

        /** The gaps in words, {@code boulder V5, V6; rope 6a}, the bands of a discipline joined by {@code between}. */
        public String gapWords(String between) {
            return String.join(
                    "; ",
                    gradeGaps.entrySet().stream()
                            .map(e -> e.getKey() + " " + String.join(between, e.getValue()))
                            .toList());
        }
    }

    /** The gym's month-end points that have a grade gap. */
    public List<MonthPoint> gymGaps() {
        return months.stream()
                .filter(p -> p.scope().equals("gym") && !p.gradeGaps().isEmpty())
                .toList();
    }

    /**
     * A wall over the period.
     *
     * @param wall the wall
     * @param discipline its discipline
     * @param resets its resets in the period, oldest first, as label and date
     * @param meanScore the mean composite score of those resets, or null without any scored
     * @param lastReset the date of its latest reset on or before asOf, or null
     * @param daysSince days from that reset to asOf, or null
     * @param cycleDays its reset cycle
     * @param overdueAfterDays days past the cycle before it is overdue
     * @param status {@code ok}, {@code due}, {@code overdue}, or {@code never reset}
     */
    public record WallStatus(
            String wall,
            Discipline discipline,
            List<Map.Entry<String, LocalDate>> resets,
            Double meanScore,
            LocalDate lastReset,
            Long daysSince,
            int cycleDays,
            int overdueAfterDays,
            String status) {

        /** Days past the cycle, 0 when not due yet, null when never reset. */
        public Long daysPastDue() {
            return daysSince == null ? null : Math.max(0, daysSince - cycleDays);
        }
    }

    /**
     * Route lifetimes: how long routes stripped in the period had been up.
     *
     * @param stripped routes stripped in the period
     * @param medianDays their median lifetime in days, or null when none
     * @param stillUp routes up on the period's last day
     */
    public record Lifetime(int stripped, Double medianDays, int stillUp) {}

    /**
     * One setter's routes in the period and their profile.
     *
     * @param setter the name
     * @param routes routes they set (alone or with others)
     * @param share their share of the period's routes
     * @param gripShares share of their hand grips per direction word, sector 0 first
     * @param holdShares share of their hand-role placements per hold type, most first (foot holds left out)
     * @param moveShares share of their routes listing each move, most first
     */
    public record SetterProfile(
            String setter,
            int routes,
            double share,
            Map<String, Double> gripShares,
            Map<String, Double> holdShares,
            Map<String, Double> moveShares) {}

    /**
     * A near-repeat found in the period.
     *
     * @param reset the reset of the later route
     * @param pair the pair, with its exact similarity
     */
    public record Repeat(String reset, RepetitionFigures.Pair pair) {}
}
