package org.variset.reports.audit;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Function;
import org.variset.archive.read.HoldRecord;
import org.variset.archive.read.RouteRecord;
import org.variset.reports.format.FigureFormat;
import org.variset.reports.scoring.grip.CircularStatistics;
import org.variset.reports.scoring.repetition.RouteFeatures;

/**
 * A setter's habits against the other setters of the same period, at the levels a setter thinks in: the hold type of
 * their hand holds, the direction their hand grips face, the moves their routes ask for, and only then a type facing a
 * direction. Foot holds are left out: they say nothing of a setter's hands. The level with the largest lead is the
 * habit named; a later level replaces an earlier one only when it leads by {@value #CLEARER} more (so "93% of their hand
 * holds are crimps" is said rather than the near-equal "91% of their grips are crimps facing up"). A habit is worth a sentence when the setter's share is at
 * least 20% and 15 points above the others' (heuristics of ours).
 */
final class SetterHabits {
    private static final double MIN_SHARE = 0.2;
    private static final double MIN_LEAD = 0.15;
    /** How much more a later, finer level must lead by to be named instead (a heuristic of ours). */
    private static final double CLEARER = 0.10;

    private SetterHabits() {}

    /** One level of habit: how its shares are counted, and how its sentence reads. */
    private record Level(Function<List<RouteRecord>, Map<String, Double>> shares, Sentence sentence) {}

    static void add(Audit audit, List<Finding> out) {
        if (audit.subject().kind() != Subject.Kind.SETTER || audit.reference() == null) {
            return;
        }
        String who = audit.subject().setter();
        List<Level> levels = List.of(
                new Level(
                        SetterHabits::typeShares,
                        (key, mine, theirs) -> mine + " of " + who + "'s hand holds are " + key + "s, against " + theirs
                                + " for the other setters in the same period."),
                new Level(
                        SetterHabits::directionShares,
                        (key, mine, theirs) -> mine + " of " + who
                                + "'s hand grips face " + key + ", against " + theirs
                                + " for the other setters in the same "
                                + "period."),
                new Level(
                        SetterHabits::moveShares,
                        (key, mine, theirs) -> mine + " of " + who + "'s routes ask for a " + key + ", against "
                                + theirs + " of the other setters' routes."),
                new Level(
                        SetterHabits::gripShares,
                        (key, mine, theirs) -> mine + " of " + who + "'s hand grips are "
                                + describeGrip(key) + " (" + key + "), against " + theirs
                                + " for the other setters in the "
                                + "same period."));
        Finding best = null;
        double bestLead = 0;
        int bestLevel = -1;
        for (int i = 0; i < levels.size(); i++) {
            Level l = levels.get(i);
            Map<String, Double> mine = l.shares().apply(audit.audited().routes());
            Map<String, Double> theirs = l.shares().apply(audit.reference().routes());
            for (Map.Entry<String, Double> e : mine.entrySet()) {
                double lead = e.getValue() - theirs.getOrDefault(e.getKey(), 0.0);
                double needed = bestLevel >= 0 && bestLevel < i ? CLEARER : 1e-9;
                if (e.getValue() >= MIN_SHARE && lead >= MIN_LEAD && lead > bestLead + needed) {
                    bestLead = lead;
                    bestLevel = i;
                    best = new Finding(
                            "setter_habit",
                            8.5 + lead,
                            l.sentence()
                                    .of(
                                            e.getKey(),
                                            FigureFormat.percent(e.getValue()),
                                            FigureFormat.percent(theirs.getOrDefault(e.getKey(), 0.0))));
                }
            }
        }
        if (best != null) {
            out.add(best);
        }
    }

    @FunctionalInterface
    private interface Sentence {
        String of(String key, String mine, String theirs);
    }

    /** Share of hand-role placements per hold type. */
    static Map<String, Double> typeShares(List<RouteRecord> routes) {
        Map<String, Double> counts = new LinkedHashMap<>();
        int n = 0;
        for (RouteRecord r : routes) {
            for (HoldRecord h : r.holds()) {
                if (h.isHand()) {
                    counts.merge(h.type(), 1.0, Double::sum);
                    n++;
                }
            }
        }
        int total = n;
        counts.replaceAll((k, v) -> v / total);
        return counts;
    }

    /** Share of directed hand grips per direction word ({@code up}, {@code down-left}). */
    static Map<String, Double> directionShares(List<RouteRecord> routes) {
        Map<String, Double> counts = new LinkedHashMap<>();
        int n = 0;
        for (RouteRecord r : routes) {
            for (HoldRecord h : r.holds()) {
                if (h.isHand()) {
                    for (double g : h.grips()) {
                        counts.merge(CircularStatistics.sectorWord(CircularStatistics.sector(g)), 1.0, Double::sum);
                        n++;
                    }
                }
            }
        }
        int total = n;
        counts.replaceAll((k, v) -> v / total);
        return counts;
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
