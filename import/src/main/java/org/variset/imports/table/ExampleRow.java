package org.variset.imports.table;

import java.util.Locale;

/**
 * The template's example row: the template writes it with this gym name, and an import refuses a row that still has
 * it (docs/spec/interchange.md), so an example left above a gym's own rows never becomes a gym of the archive.
 */
public final class ExampleRow {
    /** The gym name of every example row. */
    public static final String GYM = "EXAMPLE ROW (delete it)";

    private ExampleRow() {}

    /** True when a gym cell is the example's, in any case and spacing. */
    public static boolean is(String gym) {
        return gym != null
                && gym.strip().replaceAll("\\s+", " ").toLowerCase(Locale.ROOT).equals(GYM.toLowerCase(Locale.ROOT));
    }
}
