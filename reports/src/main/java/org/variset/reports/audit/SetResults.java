package org.variset.reports.audit;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.variset.archive.grade.Discipline;
import org.variset.archive.read.RouteRecord;
import org.variset.archive.settings.GymSettings;
import org.variset.reports.figures.GradeGaps;
import org.variset.reports.figures.RouteFeatureMapper;
import org.variset.reports.figures.SetFigures;
import org.variset.reports.scoring.grades.GradeFigures;
import org.variset.reports.scoring.repetition.Repetition;
import org.variset.reports.scoring.repetition.RepetitionFigures;
import org.variset.reports.scoring.score.CompositeScore;

/** Builds {@link SetResult}s from routes already read: repetition, hold reuse and the score; pure. */
public final class SetResults {
    private SetResults() {}

    /**
     * A reset compared with its look-back window, with hold reuse against the wall's previous resets
     * ({@code previousKeys} null: hold reuse not measured).
     */
    public static SetResult reset(
            String name,
            List<RouteRecord> routes,
            int windowRoutes,
            RepetitionFigures rep,
            boolean firstOnWall,
            Set<String> previousKeys,
            SetFigures standing,
            GymSettings settings) {
        SetFigures f = SetFigures.of(routes, settings);
        Map<String, String> why = new LinkedHashMap<>();
        List<Set<String>> keys = RouteFeatureMapper.reuseKeys(routes);
        Double reuse = null;
        if (previousKeys == null) {
            why.put("hold_reuse_rate", "not measured here");
        } else if (firstOnWall) {
            why.put("hold_reuse_rate", "the wall has no earlier reset");
        } else if (keys.stream().allMatch(Set::isEmpty)) {
            why.put("hold_reuse_rate", "no placement of this reset has a hold_ref");
        } else {
            reuse = Repetition.holdReuseRate(keys, previousKeys);
        }
        if (rep.novelty() == null) {
            why.put("novelty", "no route of this reset has enough detail (4 hold and move features) to compare");
        }
        CompositeScore score = score(f, standing, mainDiscipline(routes), rep.novelty(), settings, why);
        return new SetResult(name, routes, f, rep, windowRoutes, reuse, score, why);
    }

    /**
     * A standing set or a setter's routes: repeats inside the set, no novelty (nothing before it to compare).
     *
     * @param gymStanding the gym's standing set, whose grades the score reads; null to leave the grades part out (a
     *     wall's own score in a trend, which then moves only with the wall's own routes)
     */
    public static SetResult standing(
            String name, List<RouteRecord> routes, SetFigures f, SetFigures gymStanding, GymSettings settings) {
        RouteFeatureMapper m = new RouteFeatureMapper(settings);
        RepetitionFigures inside = Repetition.of(m.features(routes), List.of(), settings.nearRepeatThreshold());
        RepetitionFigures rep = new RepetitionFigures(
                List.of(), inside.internalRepeats(), inside.setAside(), null, inside.notEnoughDetail());
        Map<String, String> why = new LinkedHashMap<>();
        why.put("novelty", "novelty compares a reset with the routes set before it; this set is not one reset");
        why.put("hold_reuse_rate", "hold reuse compares a reset with the wall's previous resets");
        if (gymStanding == null) {
            why.put(
                    "grades",
                    "the grades part is the gym's (its routes up against the target), left out of a wall's own score");
        }
        CompositeScore score = score(f, gymStanding, mainDiscipline(routes), null, settings, why);
        return new SetResult(name, routes, f, rep, 0, null, score, why);
    }

    /** A set shown beside the audited one, scored on its own figures. */
    public static SetResult context(String name, List<RouteRecord> routes, SetFigures f, GymSettings settings) {
        Map<String, String> why = new LinkedHashMap<>();
        why.put("novelty", "not measured for a set shown for comparison");
        CompositeScore score = score(f, f, mainDiscipline(routes), null, settings, why);
        return new SetResult(name, routes, f, null, 0, null, score, why);
    }

    /**
     * The composite score (docs/spec/metrics.md section 7). Coverage can exceed 1 when a set uses terms outside the
     * vocabulary (its richness is then above K); the part is capped at 1.
     */
    static CompositeScore score(
            SetFigures f,
            SetFigures gradesFrom,
            Discipline main,
            Double novelty,
            GymSettings settings,
            Map<String, String> why) {
        Map<String, Double> parts = new LinkedHashMap<>();
        parts.put("grip", f.grip().sectorEntropy());
        parts.put("holds", cap(f.holds().coverage()));
        parts.put("moves", cap(f.moves().coverage()));
        GradeFigures g =
                main == null || gradesFrom == null ? null : gradesFrom.grades().get(main);
        GradeFigures own = main == null ? null : f.grades().get(main);
        parts.put(
                "grades",
                g == null ? null : CompositeScore.gradesPart(g.emdToTarget(), GradeGaps.missingShare(g, own)));
        parts.put("novelty", novelty);
        CompositeScore s = CompositeScore.of(parts, settings.scoreWeights());
        if (s.score() == null) {
            why.put(
                    "score",
                    "fewer than three of its parts could be measured (missing: " + String.join(", ", s.dropped())
                            + ")");
        }
        return s;
    }

    /** The discipline most of the routes have (boulder on a tie), or null for none. */
    public static Discipline mainDiscipline(List<RouteRecord> routes) {
        long boulders = routes.stream()
                .filter(r -> r.discipline() == Discipline.BOULDER)
                .count();
        if (routes.isEmpty()) {
            return null;
        }
        return boulders * 2 >= routes.size() ? Discipline.BOULDER : Discipline.ROPE;
    }

    private static Double cap(Double coverage) {
        return coverage == null ? null : Math.min(1.0, coverage);
    }
}
