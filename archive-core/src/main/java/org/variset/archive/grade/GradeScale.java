package org.variset.archive.grade;

import java.util.Locale;

/** The grading scales Variset reads. Each belongs to one discipline, except the numeric IRCRA scale. */
public enum GradeScale {
    /** The V-scale for boulders (VB, V0-, V0 ... V16). */
    V("v", Discipline.BOULDER, "V"),
    /** Fontainebleau boulder grades (3 ... 8C+), written with an upper-case letter. */
    FONT("font", Discipline.BOULDER, "Font"),
    /** The Yosemite Decimal System for roped routes (5.1 ... 5.15c). */
    YDS("yds", Discipline.ROPE, "YDS"),
    /** French sport grades for roped routes (1 ... 9b+), written with a lower-case letter. */
    FRENCH("french", Discipline.ROPE, "French"),
    /** UIAA grades for roped routes, in Arabic (7+) or Roman (VII+) numerals. */
    UIAA("uiaa", Discipline.ROPE, "UIAA"),
    /** The IRCRA reporting scale itself: a number on the axis. Read only when named explicitly. */
    IRCRA("ircra", null, "IRCRA");

    private final String word;
    private final Discipline discipline;
    private final String displayName;

    GradeScale(String word, Discipline discipline, String displayName) {
        this.word = word;
        this.discipline = discipline;
        this.displayName = displayName;
    }

    /** The word used in files and on the command line ({@code v}, {@code font}, ...). */
    public String word() {
        return word;
    }

    /** The discipline this scale grades, or null for IRCRA, which grades both. */
    public Discipline discipline() {
        return discipline;
    }

    /** The name printed for people ({@code Font}, {@code YDS}, ...). */
    public String displayName() {
        return displayName;
    }

    /**
     * Reads a scale word, ignoring case and surrounding spaces.
     *
     * @throws IllegalArgumentException naming the accepted words when the text is none of them
     */
    public static GradeScale parse(String text) {
        String t = text == null ? "" : text.strip().toLowerCase(Locale.ROOT);
        for (GradeScale s : values()) {
            if (s.word.equals(t)) {
                return s;
            }
        }
        throw new IllegalArgumentException(
                "'" + text + "' is not a grade scale (expected one of v, font, yds, french, uiaa, ircra)");
    }
}
