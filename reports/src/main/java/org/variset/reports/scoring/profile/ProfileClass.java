package org.variset.reports.scoring.profile;

/** How a route's difficulty is spread over its moves (docs/spec/metrics.md section 4), in the spec's order. */
public enum ProfileClass {
    /** CV below 0.15: every move about as hard as the others. */
    STEADY,
    /** No crux move. */
    SUSTAINED,
    /** One crux move. */
    SINGLE_CRUX,
    /** Two or more crux moves. */
    MULTI_CRUX,
    /** Fewer than three move difficulties given. */
    UNCLASSIFIED;

    /** The JSON key ({@code single_crux}). */
    public String key() {
        return name().toLowerCase(java.util.Locale.ROOT);
    }
}
