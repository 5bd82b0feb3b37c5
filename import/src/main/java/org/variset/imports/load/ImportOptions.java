package org.variset.imports.load;

import java.time.ZoneId;
import java.util.Objects;

/**
 * How to import.
 *
 * @param dryRun validate and report what would change, write nothing
 * @param skipBadRows import the good rows and list each skipped one
 * @param update let changed rows replace what the archive holds for their route
 * @param newGymZone the time zone given to a gym the import creates
 */
public record ImportOptions(boolean dryRun, boolean skipBadRows, boolean update, ZoneId newGymZone) {

    /** Checks the fields. */
    public ImportOptions {
        Objects.requireNonNull(newGymZone, "newGymZone");
    }

    /** Defaults: write, refuse bad rows and changes, the system's time zone. */
    public static ImportOptions defaults() {
        return new ImportOptions(false, false, false, ZoneId.systemDefault());
    }

    /** The same options with dry-run set. */
    public ImportOptions withDryRun(boolean on) {
        return new ImportOptions(on, skipBadRows, update, newGymZone);
    }

    /** The same options with skip-bad-rows set. */
    public ImportOptions withSkipBadRows(boolean on) {
        return new ImportOptions(dryRun, on, update, newGymZone);
    }

    /** The same options with update set. */
    public ImportOptions withUpdate(boolean on) {
        return new ImportOptions(dryRun, skipBadRows, on, newGymZone);
    }
}
