package org.variset.reports.plan;

import java.time.LocalDate;
import java.util.List;
import java.util.Map;
import org.variset.archive.grade.Discipline;
import org.variset.archive.problem.Remedy;

/**
 * What the next reset of a wall could bring.
 *
 * @param gym the gym
 * @param wall the wall
 * @param on the day planned for
 * @param discipline the wall's discipline
 * @param routes how many routes the reset brings
 * @param grades the proposed grade slots, or null without a target (see {@code undefined})
 * @param gaps categories whose standing share is below their twelve-month share by the margin
 * @param margin the margin, in share points
 * @param baseline what the gaps are measured against
 * @param shapesToRest the hand-hold shapes (hold_ref) the wall used most in its last three resets, with how many
 *     placements, at most twelve, most used first
 * @param shapesOnWall how many hand-hold shapes those resets used in all
 * @param undefined for each part that could not be planned, why
 */
public record ResetPlan(
        String gym,
        String wall,
        LocalDate on,
        Discipline discipline,
        int routes,
        GradeSlots grades,
        List<VarietyGaps.Gap> gaps,
        double margin,
        Baseline baseline,
        Map<String, Long> shapesToRest,
        int shapesOnWall,
        Map<String, String> undefined) {

    /** What the gym can do for a fuller plan: set a grade target when there is none for the discipline. */
    public Remedy remedy() {
        return grades == null ? Remedy.of(Remedy.Kind.SET_TARGET, "discipline", discipline.word()) : Remedy.NONE;
    }

    /**
     * What the variety gaps are measured against: the median share over the last twelve months' resets of walls
     * like this one.
     *
     * @param walls the walls (this one, and those of a similar angle)
     * @param resets how many resets of theirs the medians are over
     */
    public record Baseline(List<String> walls, int resets) {}

    /**
     * The grade slots proposed for the reset, against the gym's target.
     *
     * @param bands the target's bands, easiest first
     * @param rest routes per band up in the rest of the gym that day (without the wall)
     * @param targetShares target shares per band, summing to 1
     * @param slots proposed slots per band
     * @param distanceNow distance to target of the gym's standing set that day (the wall's current routes included)
     * @param distanceAfter distance to target after the reset with the proposed slots
     * @param outsideTarget routes of the rest outside the target's bands, left out
     * @param targetIsDefault true when the target is the example pyramid
     * @param previousMix routes per band of the wall's latest reset (the tie-break)
     */
    public record GradeSlots(
            List<String> bands,
            long[] rest,
            double[] targetShares,
            int[] slots,
            Double distanceNow,
            Double distanceAfter,
            long outsideTarget,
            boolean targetIsDefault,
            long[] previousMix) {}
}
