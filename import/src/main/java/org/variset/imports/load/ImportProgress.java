package org.variset.imports.load;

/** Hears how far an import has got, so a front end can show progress. */
public interface ImportProgress {
    /** Does nothing. */
    ImportProgress NONE = (phase, rows) -> {};

    /**
     * Called now and then during a long pass.
     *
     * @param phase what is being done ({@code checking holds}, {@code writing holds})
     * @param rows rows done so far in this phase
     */
    void advanced(String phase, long rows);

    /**
     * Called when a phase of the import ends, with how long it took (for a front end's timings).
     *
     * @param phase the phase ({@code reading routes}, {@code checking holds}, {@code writing holds}, ...)
     * @param nanos how long it took
     */
    default void finished(String phase, long nanos) {}
}
