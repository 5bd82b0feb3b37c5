package org.variset.reports.audit;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.variset.archive.read.HoldRecord;
import org.variset.archive.read.RouteRecord;
import org.variset.reports.format.FigureFormat;
import org.variset.reports.scoring.grip.CircularStatistics;
import org.variset.reports.scoring.repetition.RouteFeatures;

/**
 * A setter's habits against the other setters of the same period: the hold type and direction (among hand grips)
 * and the move (among routes) whose share is furthest above the others'. A habit is worth a sentence when the
 * setter's share is at least 20% and 15 points above the others' (heuristics of ours).
 */
final class SetterHabits {
    private static final double MIN_SHARE = 0.2;
    private static final double MIN_LEAD = 0.15;

    private SetterHabits() {}

    static void add(Audit audit, List<Finding> out) {
        if (audit.subject().kind() != Subject.Kind.SETTER || audit.reference() == null) {
            return;
        }
        String who = audit.subject().setter();
        habit(
                gripShares(audit.audited().routes()),
                gripShares(audit.reference().routes()),
                8.5,
                out,
                (key, mine, theirs) -> mine + " of " + who + "'s hand grips are " + describeGrip(key) + " (" + key
                        + "), against " + theirs + " for the other setters in the same period.");
        habit(
                moveShares(audit.audited().routes()),
                moveShares(audit.reference().routes()),
                7.5,
                out,
                (key, mine, theirs) -> mine + " of " + who + "'s routes ask for a " + key + ", against " + theirs
                        + " of the other setters' routes.");
    }

    @FunctionalInterface
    private interface Sentence {
        String of(String key, String mine, String theirs);
    }

    private static void habit(
            Map<String, Double> mine, Map<String, Double> theirs, double weight, List<Finding> out, Sentence sentence) {
        String best = null;
        double lead = 0;
        for (Map.Entry<String, Double> e : mine.entrySet()) {
            double d = e.getValue() - theirs.getOrDefault(e.getKey(), 0.0);
            if (e.getValue() >= MIN_SHARE && d >= MIN_LEAD && d > lead) {
                best = e.getKey();
                lead = d;
            }
        }
        if (best != null) {
            out.add(new Finding(
                    "setter_habit",
                    weight + lead,
                    sentence.of(
                            best,
                            FigureFormat.percent(mine.get(best)),
                            FigureFormat.percent(theirs.getOrDefault(best, 0.0)))));
        }
    }

    /** Share of directed hand grips per {@code type@direction}. */
    static Map<String, Double> gripShares(List<RouteRecord> routes) {
        Map<String, Double> counts = new LinkedHashMap<>();
        int n = 0;
        for (RouteRecord r : routes) {
            for (HoldRecord h : r.holds()) {
                if (!h.isHand()) {
                    continue;
                }
                for (double g : h.grips()) {
                    counts.merge(
                            h.type() + "@" + RouteFeatures.sectorDegrees(CircularStatistics.sector(g)),
                            1.0,
                            Double::sum);
                    n++;
                }
            }
        }
        int total = n;
        counts.replaceAll((k, v) -> v / total);
        return counts;
    }

    /** Share of routes listing each move. */
    static Map<String, Double> moveShares(List<RouteRecord> routes) {
        Map<String, Double> out = new LinkedHashMap<>();
        for (RouteRecord r : routes) {
            r.moves().stream().distinct().forEach(m -> out.merge(m, 1.0 / routes.size(), Double::sum));
        }
        return out;
    }

    /** "crimps facing up" from {@code crimp@0}. */
    static String describeGrip(String key) {
        String[] tp = key.split("@");
        return tp[0] + "s facing " + CircularStatistics.sectorWord(Integer.parseInt(tp[1]) / 45);
    }
}
