package org.variset.reports.audit;

import java.time.LocalDate;
import java.util.Objects;

/** What to audit. Every target names its gym, or null when the archive holds one. */
public sealed interface AuditTarget {

    /** The gym's name, or null for the only one. */
    String gym();

    /**
     * One reset by its label.
     *
     * @param gym the gym, or null
     * @param label the reset's label
     */
    record Reset(String gym, String label) implements AuditTarget {
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
     * @param on the day
     */
    record LatestReset(String gym, String wall, LocalDate on) implements AuditTarget {
        /** Checks the fields. */
        public LatestReset {
            Objects.requireNonNull(wall, "wall");
            Objects.requireNonNull(on, "on");
        }
    }

    /**
     * The routes up on a day, on one wall or in the whole gym.
     *
     * @param gym the gym, or null
     * @param wall the wall, or null for the whole gym
     * @param on the day
     */
    record Standing(String gym, String wall, LocalDate on) implements AuditTarget {
        /** Checks the day. */
        public Standing {
            Objects.requireNonNull(on, "on");
        }
    }

    /**
     * The routes one setter set (with others or alone) in a period, both ends included.
     *
     * @param gym the gym, or null
     * @param setter the setter's name
     * @param from the first day
     * @param to the last day
     */
    record SetterPeriod(String gym, String setter, LocalDate from, LocalDate to) implements AuditTarget {
        /** Checks the period. */
        public SetterPeriod {
            Objects.requireNonNull(setter, "setter");
            if (from.isAfter(to)) {
                throw new IllegalArgumentException("the period starts (" + from + ") after it ends (" + to + ")");
            }
        }
    }
}
