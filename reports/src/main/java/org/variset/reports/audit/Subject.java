package org.variset.reports.audit;

import java.time.LocalDate;

/**
 * What an audit looked at, resolved against the archive.
 *
 * @param kind what kind of set
 * @param gym the gym's name
 * @param wall the wall's name, or null for the whole gym or a setter
 * @param reset the reset's label, or null
 * @param on the reset's date or the standing day; for a setter, the last day
 * @param from for a setter, the first day; otherwise null
 * @param setter the setter's name, or null
 */
public record Subject(Kind kind, String gym, String wall, String reset, LocalDate on, LocalDate from, String setter) {

    /** The kinds of set an audit looks at. */
    public enum Kind {
        /** One reset of one wall. */
        RESET,
        /** The routes up on one wall on a day. */
        WALL_STANDING,
        /** The routes up in the whole gym on a day. */
        GYM_STANDING,
        /** One setter's routes over a period. */
        SETTER;

        /** The JSON word ({@code wall_standing}). */
        public String key() {
            return name().toLowerCase(java.util.Locale.ROOT);
        }
    }

    /**
     * A title for the audit, without the gym (the renderers add it once): {@code Reset Cave 2026-03-02}, or with a
     * label of the gym's own {@code Reset Spring A (Cave, 2026-03-02)}; {@code Cave, routes up on 2026-03-02};
     * {@code Routes up on 2026-03-02} for the whole gym ...
     */
    public String title() {
        return switch (kind) {
            case RESET ->
                (wall + " " + on).equals(reset) ? "Reset " + reset : "Reset " + reset + " (" + wall + ", " + on + ")";
            case WALL_STANDING -> wall + ", routes up on " + on;
            case GYM_STANDING -> "Routes up on " + on;
            case SETTER -> setter + ", routes set " + from + " to " + on;
        };
    }

    /** The period the audit covers, as text. */
    public String period() {
        return kind == Kind.SETTER ? from + " to " + on : on.toString();
    }
}
