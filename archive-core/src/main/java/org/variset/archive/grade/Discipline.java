package org.variset.archive.grade;

import java.util.Locale;

/** What kind of climb a route is: a boulder problem or a roped route. */
public enum Discipline {
    /** A boulder problem, climbed above mats without a rope. */
    BOULDER,
    /** A route climbed on a rope (lead or top rope). */
    ROPE;

    /** The word used in files and on the command line ({@code boulder}, {@code rope}). */
    public String word() {
        return name().toLowerCase(Locale.ROOT);
    }

    /**
     * Reads a discipline word, ignoring case and surrounding spaces.
     *
     * @throws IllegalArgumentException naming the accepted words when the text is neither
     */
    public static Discipline parse(String text) {
        String t = text == null ? "" : text.strip().toLowerCase(Locale.ROOT);
        for (Discipline d : values()) {
            if (d.word().equals(t)) {
                return d;
            }
        }
        throw new IllegalArgumentException("'" + text + "' is not a discipline (expected boulder or rope)");
    }
}
