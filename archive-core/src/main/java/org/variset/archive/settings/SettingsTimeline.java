package org.variset.archive.settings;

import java.time.LocalDate;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * A gym's settings on any day, from its whole history read once (for work over many days, such as indexing every
 * route with the bands of its set date). Days with the same values in effect share one {@link GymSettings}.
 */
public final class SettingsTimeline {
    private final List<SettingValue> history;
    private final Map<Integer, GymSettings> byChangesInEffect = new HashMap<>();

    /** A timeline over a gym's history, in the order the values took effect. */
    public SettingsTimeline(List<SettingValue> history) {
        this.history = List.copyOf(history);
    }

    /** The settings in effect on a day. */
    public GymSettings on(LocalDate day) {
        int n = 0;
        while (n < history.size() && !history.get(n).effectiveOn().isAfter(day)) {
            n++;
        }
        int inEffect = n;
        return byChangesInEffect.computeIfAbsent(inEffect, k -> GymSettings.of(history.subList(0, inEffect)));
    }
}
