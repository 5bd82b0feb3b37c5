package org.variset.archive.gym;

import java.time.Clock;
import java.time.LocalDate;
import java.util.Objects;

/**
 * The gym's own "today": the calendar date in the gym's time zone, from an injected clock so that tests can
 * fix it (docs/spec/interchange.md: "Today is the gym's local date").
 */
public final class GymCalendar {
    private final Clock clock;

    /** A calendar on the given clock. */
    public GymCalendar(Clock clock) {
        this.clock = Objects.requireNonNull(clock, "clock");
    }

    /** A calendar on the system clock. */
    public static GymCalendar system() {
        return new GymCalendar(Clock.systemUTC());
    }

    /** Today's date at the gym. */
    public LocalDate today(Gym gym) {
        return today(gym.zone());
    }

    /** Today's date in a time zone. */
    public LocalDate today(java.time.ZoneId zone) {
        return LocalDate.now(clock.withZone(zone));
    }
}
