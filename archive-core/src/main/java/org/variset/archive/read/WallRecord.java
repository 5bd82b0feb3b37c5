package org.variset.archive.read;

import org.variset.archive.gym.WallDiscipline;

/**
 * A wall as read from the archive.
 *
 * @param id the database id
 * @param gymId its gym's id
 * @param name its name
 * @param discipline boulder, rope or both; null when not given
 * @param angleDeg its angle from vertical, or null
 * @param heightM its height, or null
 * @param widthM its width, or null
 * @param cycleDays how often the gym means to reset it, from the walls file; null when not given
 */
public record WallRecord(
        long id,
        long gymId,
        String name,
        WallDiscipline discipline,
        Double angleDeg,
        Double heightM,
        Double widthM,
        Integer cycleDays) {}
