package org.variset.archive.route;

import java.util.Locale;

/** The size class of a hold, from extra small to extra large. */
public enum HoldSize {
    /** Extra small. */
    XS,
    /** Small. */
    S,
    /** Medium. */
    M,
    /** Large. */
    L,
    /** Extra large. */
    XL;

    /** The word used in files ({@code xs} ... {@code xl}). */
    public String word() {
        return name().toLowerCase(Locale.ROOT);
    }

    /**
     * Reads a size word, ignoring case.
     *
     * @throws IllegalArgumentException naming the accepted words
     */
    public static HoldSize parse(String text) {
        String t = text == null ? "" : text.strip().toLowerCase(Locale.ROOT);
        for (HoldSize s : values()) {
            if (s.word().equals(t)) {
                return s;
            }
        }
        throw new IllegalArgumentException("'" + text + "' is not a hold size (expected xs, s, m, l or xl)");
    }
}
