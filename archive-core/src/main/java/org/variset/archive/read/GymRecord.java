package org.variset.archive.read;

import java.time.ZoneId;

/**
 * A gym as read from the archive.
 *
 * @param id the database id
 * @param name its name
 * @param zone its time zone, which decides what "today" is
 */
public record GymRecord(long id, String name, ZoneId zone) {}
