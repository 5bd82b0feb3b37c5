package org.variset.reports;

/** The caution every audit carries: Variset measures variety and never judges safety. */
public final class Safety {
    /** The caution, one paragraph. */
    public static final String CAUTION = "Route setting is work at height with falling climbers below it. Hold "
            + "fastening and inspection, fall zones and matting follow the EN 12572 series, the manufacturers' "
            + "instructions, local codes and qualified practice. Variset measures the variety of what was set; it "
            + "does not judge whether a route or wall is safe.";

    private Safety() {}
}
