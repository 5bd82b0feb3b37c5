package org.variset.reports.audit;

import java.time.LocalDate;
import java.util.Objects;

/**
 * What to audit. Every target names its gym, or null when the archive holds one. A wall's latest reset and a setter's
 * period may leave their day out (null: today at the gym); {@link #onDay} fills it in before an audit.
 */
public sealed interface AuditTarget {

    /** The gym's name, or null for the only one. */
    String gym();

    /** This target with "today" given where it left its day out. */
    default AuditTarget onDay(LocalDate today) {
        if (this instanceof LatestReset l && l.on() == null) {
            return new LatestReset(l.gym(), l.wall(), today);
        }
        if (this instanceof SetterPeriod p && p.to() == null) {
            return new SetterPeriod(p.gym(), p.setter(), p.from(), today);
        }
        return this;
    }

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
     * @param on the day, or null for today
     */
    record LatestReset(String gym, String wall, LocalDate on) implements AuditTarget {
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
     * @param to the last day, or null for today
     */
    record SetterPeriod(String gym, String setter, LocalDate from, LocalDate to) implements AuditTarget {
        /** Checks the period. */
        public SetterPeriod {
            Objects.requireNonNull(setter, "setter");
            Objects.requireNonNull(from, "from");
            if (to != null && from.isAfter(to)) {
                throw new IllegalArgumentException("the period starts (" + from + ") after it ends (" + to + ")");
            }
        }
    }
}
