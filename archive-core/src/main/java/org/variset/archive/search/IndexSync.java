package org.variset.archive.search;

/**
 * What bringing the index up to date with the database did.
 *
 * @param action what was done
 * @param routes how many routes were indexed or removed
 * @param reason why a rebuild happened, or empty
 * @param stamp the database's change stamp the index now carries
 */
public record IndexSync(Action action, long routes, String reason, long stamp) {

    /** What was done. */
    public enum Action {
        /** The index already carried the database's stamp. */
        CURRENT,
        /** The changes it had not seen were applied. */
        CAUGHT_UP,
        /** It was built again from the database. */
        REBUILT
    }

    /** A sentence for people, or empty when nothing was done. */
    public String notice() {
        return switch (action) {
            case CURRENT -> "";
            case CAUGHT_UP ->
                "The search index was behind the archive; brought " + routes + (routes == 1 ? " route" : " routes")
                        + " up to date.";
            case REBUILT -> "Built the search index from the archive (" + routes + " routes): " + reason + ".";
        };
    }
}
