package org.variset.archive.gym;

import java.util.Locale;
import org.variset.archive.grade.Discipline;

/** What a wall is set for: boulders, roped routes, or both. */
public enum WallDiscipline {
    /** Boulder problems only. */
    BOULDER,
    /** Roped routes only. */
    ROPE,
    /** Both. */
    BOTH;

    /** The word used in files ({@code boulder}, {@code rope}, {@code both}). */
    public String word() {
        return name().toLowerCase(Locale.ROOT);
    }

    /** True when a route of the discipline belongs on such a wall. */
    public boolean allows(Discipline d) {
        return this == BOTH || name().equals(d.name());
    }

    /**
     * Reads a wall discipline word, ignoring case.
     *
     * @throws IllegalArgumentException naming the accepted words
     */
    public static WallDiscipline parse(String text) {
        String t = text == null ? "" : text.strip().toLowerCase(Locale.ROOT);
        for (WallDiscipline d : values()) {
            if (d.word().equals(t)) {
                return d;
            }
        }
        throw new IllegalArgumentException("'" + text + "' is not a wall discipline (expected boulder, rope or both)");
    }
}
