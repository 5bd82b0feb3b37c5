package org.variset.archive.search;

import java.util.Locale;

/** How hits are ordered. */
public enum SearchOrder {
    /** Best match first; equal matches newest first. */
    RELEVANCE,
    /** Most recently set first. */
    NEWEST,
    /** Easiest first on the IRCRA axis, then newest. */
    GRADE;

    /** The word on the command line. */
    public String word() {
        return name().toLowerCase(Locale.ROOT);
    }
}
