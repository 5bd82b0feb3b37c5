package org.variset.imports.load;

/** Hears how far an import has got, so a front end can show progress. */
public interface ImportProgress {
    /** Does nothing. */
    ImportProgress NONE = (phase, rows) -> { };

    /**
     * Called now and then during a long pass.
     *
     * @param phase what is being done ({@code checking holds}, {@code writing holds})
     * @param rows rows done so far in this phase
     */
    void advanced(String phase, long rows);
}
