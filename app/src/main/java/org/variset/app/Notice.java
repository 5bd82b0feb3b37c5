package org.variset.app;

import java.util.Objects;

/**
 * Something a use case tells the person while it works, beside its result: the search index was behind and is
 * current again, or could not be updated (the archive itself is complete).
 *
 * @param kind what kind of notice
 * @param text the notice in plain words
 */
public record Notice(Kind kind, String text) {

    /** The kinds of notice. */
    public enum Kind {
        /** For the person's information. */
        INFO,
        /** Worth attention, though the work was done. */
        WARNING
    }

    /** Checks the fields. */
    public Notice {
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(text, "text");
    }
}
