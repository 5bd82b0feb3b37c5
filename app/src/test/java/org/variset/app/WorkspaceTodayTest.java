package org.variset.app;

import static org.assertj.core.api.Assertions.assertThat;

import java.time.Clock;
import java.time.Instant;
import java.time.LocalDate;
import java.time.ZoneId;
import java.time.ZoneOffset;
import org.junit.jupiter.api.Test;
import org.variset.archive.gym.Gym;
import org.variset.archive.testing.TestArchives;

/** "Today" is the gym's own date, in its time zone (docs/spec/interchange.md), from the workspace's clock. */
class WorkspaceTodayTest {
    /** 23:30 UTC on 2 December 2026: still the 2nd in Denver (UTC−7), already the 3rd in Auckland (UTC+13). */
    private static final Clock LATE = Clock.fixed(Instant.parse("2026-12-02T23:30:00Z"), ZoneOffset.UTC);

    @Test
    void isTheDateInTheNamedGymsTimeZone() {
        try (Workspace w = Workspace.over(TestArchives.fresh(), LATE, Notices.NONE)) {
            w.archive().inTransaction(s -> {
                s.persist(new Gym("Alder Ridge", ZoneId.of("America/Denver")));
                s.persist(new Gym("Kowhai Hall", ZoneId.of("Pacific/Auckland")));
            });
            assertThat(w.today("Alder Ridge")).isEqualTo(LocalDate.of(2026, 12, 2));
            assertThat(w.today("Kowhai Hall")).isEqualTo(LocalDate.of(2026, 12, 3));
            assertThat(w.today(null))
                    .as("several gyms, none named: the first by name")
                    .isEqualTo(LocalDate.of(2026, 12, 2));
        }
    }

    @Test
    void isTheDateInUtcWhileTheArchiveHoldsNoGym() {
        try (Workspace w = Workspace.over(TestArchives.fresh(), LATE, Notices.NONE)) {
            assertThat(w.today(null)).isEqualTo(LocalDate.of(2026, 12, 2));
        }
    }
}
