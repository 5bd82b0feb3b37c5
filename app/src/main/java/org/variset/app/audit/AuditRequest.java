package org.variset.app.audit;

import java.time.LocalDate;
import java.util.Objects;

/** What to audit, as a person names it. Every request names its gym, or null when the archive holds one. */
public sealed interface AuditRequest {

    /** The gym's name, or null for the only one. */
    String gym();

    /**
     * One reset by its label.
     *
     * @param gym the gym, or null
     * @param label the reset's label
     */
    record Reset(String gym, String label) implements AuditRequest {
        /** Checks the label. */
        public Reset {
            Objects.requireNonNull(label, "label");
        }
    }

    /**
     * A wall's latest reset on or before a day.
     *
     * @param gym the gym, or null
     * @param wall the wall
     * @param on the day, or null for today at the gym
     */
    record LatestReset(String gym, String wall, LocalDate on) implements AuditRequest {
        /** Checks the wall. */
        public LatestReset {
            Objects.requireNonNull(wall, "wall");
        }
    }

    /**
     * The routes up on a day, on one wall or in the whole gym.
     *
     * @param gym the gym, or null
     * @param wall the wall, or null for the whole gym
     * @param on the day
     */
    record Standing(String gym, String wall, LocalDate on) implements AuditRequest {
        /** Checks the day. */
        public Standing {
            Objects.requireNonNull(on, "on");
        }
    }

    /**
     * One setter's routes over a period, both ends included.
     *
     * @param gym the gym, or null
     * @param setter the setter's name
     * @param from the first day
     * @param to the last day, or null for today at the gym
     */
    record SetterPeriod(String gym, String setter, LocalDate from, LocalDate to) implements AuditRequest {
        /** Checks the setter and the first day. */
        public SetterPeriod {
            Objects.requireNonNull(setter, "setter");
            Objects.requireNonNull(from, "from");
        }
    }
}
