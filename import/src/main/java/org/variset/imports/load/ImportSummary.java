package org.variset.imports.load;

import java.util.List;
import java.util.Set;

/**
 * What an import did, or would do in a dry run.
 *
 * @param dryRun true when nothing was written
 * @param routesNew routes not in the archive before
 * @param routesUnchanged routes the archive already held exactly (holds included)
 * @param routesChanged routes whose rows differ from the archive (updated when the import allows updates, else refused)
 * @param newGyms gyms created (or that would be), by name
 * @param newWalls walls created (or that would be)
 * @param newSetters setters created (or that would be), by name
 * @param wallsChanged walls whose attributes changed
 * @param holdsWritten hold placements written (or that would be)
 * @param changes one line per changed route or wall, naming what differs
 * @param warnings located lines about rows imported as written that may still be wrong (hand holds with no direction)
 * @param skipped problems of rows that were skipped (when bad rows are skipped), each naming file and line
 * @param skippedCount how many rows were skipped
 * @param extraColumns columns the spec does not define, kept as extra fields
 * @param unknownTerms moves and styles not in the vocabulary, kept as written
 */
public record ImportSummary(
        boolean dryRun,
        long routesNew,
        long routesUnchanged,
        long routesChanged,
        List<String> newGyms,
        List<NewWall> newWalls,
        List<String> newSetters,
        long wallsChanged,
        long holdsWritten,
        List<String> changes,
        List<String> warnings,
        List<String> skipped,
        long skippedCount,
        Set<String> extraColumns,
        Set<String> unknownTerms) {

    /** A wall the import creates: its gym and its name. */
    public record NewWall(String gym, String wall) {}

    /** How many walls the import creates. */
    public long wallsNew() {
        return newWalls.size();
    }
}
