package org.variset.archive.read;

import java.time.LocalDate;
import java.util.Comparator;
import java.util.List;
import org.variset.archive.grade.Discipline;
import org.variset.archive.grade.GradeScale;

/**
 * A route or boulder problem as read from the archive, with its holds in file order.
 *
 * @param id the database id
 * @param gym the gym's name
 * @param wall the wall's name
 * @param reset the label of its reset
 * @param resetOn the date of its reset
 * @param label the gym's label for it
 * @param setOn the day it went up
 * @param strippedOn the day it came down, or null while up
 * @param discipline boulder or rope
 * @param gradeText the grade as written
 * @param gradeScale the scale it was read in
 * @param ircra its value on the IRCRA axis
 * @param color tape or hold colour, or null
 * @param angleDeg the angle where it climbs: its own, else its wall's, else null
 * @param ownAngleDeg its own angle as imported, or null when it takes its wall's
 * @param setters setter names in the order given
 * @param moves notable move descriptors in climbing order
 * @param styles style tags
 * @param moveDifficulty the setters' difficulty of each hand move, 1 to 10
 * @param notes free text, or null
 * @param holds hold placements in file order
 * @param extraFields the extra columns it was imported with, in file order
 */
public record RouteRecord(
        long id,
        String gym,
        String wall,
        String reset,
        LocalDate resetOn,
        String label,
        LocalDate setOn,
        LocalDate strippedOn,
        Discipline discipline,
        String gradeText,
        GradeScale gradeScale,
        double ircra,
        String color,
        Double angleDeg,
        Double ownAngleDeg,
        List<String> setters,
        List<String> moves,
        List<String> styles,
        List<Integer> moveDifficulty,
        String notes,
        List<HoldRecord> holds,
        java.util.Map<String, String> extraFields) {

    /** Copies the lists. */
    public RouteRecord {
        extraFields = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(extraFields));
        setters = List.copyOf(setters);
        moves = List.copyOf(moves);
        styles = List.copyOf(styles);
        moveDifficulty = List.copyOf(moveDifficulty);
        holds = List.copyOf(holds);
    }

    /** How reports name the route: its label, wall and set date ({@code Blue 7 (Cave, 2026-03-14)}). */
    public String name() {
        return label + " (" + wall + ", " + setOn + ")";
    }

    /** True when the route is up on the date: set_on &lt;= d and (not stripped, or d &lt; stripped_on). */
    public boolean standingOn(LocalDate d) {
        return !setOn.isAfter(d) && (strippedOn == null || d.isBefore(strippedOn));
    }

    /** The hand-role placements (hand, start, finish) in climbing order: by seq where given, then file order. */
    public List<HoldRecord> handHoldsInOrder() {
        return holds.stream()
                .filter(HoldRecord::isHand)
                .sorted(Comparator.comparing(HoldRecord::seq, Comparator.nullsLast(Comparator.naturalOrder())))
                .toList();
    }
}
