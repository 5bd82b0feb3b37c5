package org.variset.archive.settings;

import com.fasterxml.jackson.databind.JsonNode;
import java.time.LocalDate;

/**
 * One value a gym gave a setting, from the day it took effect.
 *
 * @param key the setting
 * @param scope what it applies to: empty for the gym, a discipline word, or {@code wall:<id>}
 * @param effectiveOn the day it took effect
 * @param value the stored JSON value, or null when the gym went back to the default that day
 */
public record SettingValue(SettingKey key, String scope, LocalDate effectiveOn, JsonNode value) {

    /**
     * The day a gym's first value of a setting takes effect when no day is given: before any route, so the value
     * applies from the archive's beginning (audits of earlier resets use it too).
     */
    public static final LocalDate THE_START = LocalDate.of(1900, 1, 1);

    /** True when the value applies from the archive's beginning. */
    public boolean fromTheStart() {
        return !effectiveOn.isAfter(THE_START);
    }

    /** The day it took effect in words: the date, or {@code the start}. */
    public String fromWords() {
        return fromTheStart() ? "the start" : effectiveOn.toString();
    }

    /** The value as a person types it, or {@code (default)}. */
    public String text() {
        return value == null ? "(default)" : key.text(value);
    }
}
