package org.variset.archive.read;

import java.time.LocalDate;

/**
 * A reset as read from the archive.
 *
 * @param id the database id
 * @param wallId its wall's id
 * @param wall its wall's name
 * @param label its label, unique in the gym
 * @param resetOn its date (the earliest set_on of its routes)
 */
public record ResetRecord(long id, long wallId, String wall, String label, LocalDate resetOn) {}
