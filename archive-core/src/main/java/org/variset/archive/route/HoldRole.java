package org.variset.archive.route;

import java.util.Locale;

/** What a hold is used for on its route. Hand roles are hand, start and finish (docs/spec/interchange.md). */
public enum HoldRole {
    /** A hand hold along the route. */
    HAND,
    /** A foot hold. */
    FOOT,
    /** A start hold (a hand role). */
    START,
    /** The finish hold (a hand role). */
    FINISH;

    /** The word used in files. */
    public String word() {
        return name().toLowerCase(Locale.ROOT);
    }

    /** True for hand, start and finish. */
    public boolean isHand() {
        return this != FOOT;
    }

    /**
     * The default role for a hold type when the file gives none: {@code foot} for foot chips and jibs,
     * {@code hand} otherwise (docs/spec/interchange.md).
     */
    public static HoldRole defaultFor(String holdType) {
        return "foot-chip".equals(holdType) || "jib".equals(holdType) ? FOOT : HAND;
    }

    /**
     * Reads a role word, ignoring case.
     *
     * @throws IllegalArgumentException naming the accepted words
     */
    public static HoldRole parse(String text) {
        String t = text == null ? "" : text.strip().toLowerCase(Locale.ROOT);
        for (HoldRole r : values()) {
            if (r.word().equals(t)) {
                return r;
            }
        }
        throw new IllegalArgumentException("'" + text + "' is not a hold role (expected hand, foot, start or finish)");
    }
}
