package org.variset.imports.load;

import java.time.ZoneId;
import java.util.Objects;
import java.util.Set;

/**
 * How to import.
 *
 * @param dryRun validate and report what would change, write nothing
 * @param skipBadRows import the good rows and list each skipped one
 * @param update let changed rows replace what the archive holds for their route
 * @param newGymZone the time zone given to a gym the import creates
 * @param newNames gym, wall and setter names confirmed as new although close to an existing one
 */
public record ImportOptions(
        boolean dryRun, boolean skipBadRows, boolean update, ZoneId newGymZone, Set<String> newNames) {

    /** Checks the fields; the names are copied. */
    public ImportOptions {
        Objects.requireNonNull(newGymZone, "newGymZone");
        newNames = Set.copyOf(newNames);
    }

    /** Defaults: write, refuse bad rows, changes and near names, the system's time zone. */
    public static ImportOptions defaults() {
        return new ImportOptions(false, false, false, ZoneId.systemDefault(), Set.of());
    }

    /** The same options with dry-run set. */
    public ImportOptions withDryRun(boolean on) {
        return new ImportOptions(on, skipBadRows, update, newGymZone, newNames);
    }

    /** The same options with skip-bad-rows set. */
    public ImportOptions withSkipBadRows(boolean on) {
        return new ImportOptions(dryRun, on, update, newGymZone, newNames);
    }

    /** The same options with update set. */
    public ImportOptions withUpdate(boolean on) {
        return new ImportOptions(dryRun, skipBadRows, on, newGymZone, newNames);
    }

    /** The same options with these names confirmed as new. */
    public ImportOptions withNewNames(Set<String> names) {
        return new ImportOptions(dryRun, skipBadRows, update, newGymZone, names);
    }
}
