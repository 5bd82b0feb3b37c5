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

    /** The value as a person types it, or {@code (default)}. */
    public String text() {
        return value == null ? "(default)" : key.text(value);
    }
}
