package org.variset.imports.row;

import java.util.Map;
import org.variset.archive.gym.WallDiscipline;

/**
 * A validated wall row.
 *
 * @param file where it came from
 * @param line its line
 * @param gym the gym's name
 * @param wall the wall's name
 * @param discipline what it is set for, or null
 * @param angleDeg angle, or null
 * @param heightM height, or null
 * @param widthM width, or null
 * @param cycleDays reset cycle, or null
 * @param extraFields extra columns in file order
 */
public record WallRow(
        String file,
        int line,
        String gym,
        String wall,
        WallDiscipline discipline,
        Double angleDeg,
        Double heightM,
        Double widthM,
        Integer cycleDays,
        Map<String, String> extraFields) {}
