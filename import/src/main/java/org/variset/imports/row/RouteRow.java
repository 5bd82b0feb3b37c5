package org.variset.imports.row;

import java.time.LocalDate;
import java.util.List;
import java.util.Map;
import org.variset.archive.grade.Discipline;
import org.variset.archive.grade.Grade;

/**
 * A validated route row.
 *
 * @param file where it came from
 * @param line its line
 * @param key what identifies it
 * @param discipline boulder or rope
 * @param grade the grade as read
 * @param strippedOn the strip date, or null
 * @param reset the reset label (given, or the default {@code <wall> <set_on>})
 * @param setters setters' names in order
 * @param color colour, or null
 * @param angleDeg angle, or null
 * @param moves move terms in order
 * @param styles style terms
 * @param moveDifficulty difficulties 1..10
 * @param notes notes, or null
 * @param extraFields extra columns in file order
 */
public record RouteRow(
        String file,
        int line,
        RouteKey key,
        Discipline discipline,
        Grade grade,
        LocalDate strippedOn,
        String reset,
        List<String> setters,
        String color,
        Double angleDeg,
        List<String> moves,
        List<String> styles,
        List<Integer> moveDifficulty,
        String notes,
        Map<String, String> extraFields) {

    /** {@code file:line}, for messages. */
    public String where() {
        return file + ":" + line;
    }
}
