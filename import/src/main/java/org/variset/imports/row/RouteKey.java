package org.variset.imports.row;

import java.time.LocalDate;
import java.util.Objects;

/**
 * What identifies a route: (gym, wall, label, set_on), compared after trimming and NFC normalisation; labels are
 * case-sensitive (docs/spec/interchange.md).
 *
 * @param gym the gym's name
 * @param wall the wall's name
 * @param label the route's label
 * @param setOn the date it went up
 */
public record RouteKey(String gym, String wall, String label, LocalDate setOn) {
    /** Checks the fields. */
    public RouteKey {
        Objects.requireNonNull(gym, "gym");
        Objects.requireNonNull(wall, "wall");
        Objects.requireNonNull(label, "label");
        Objects.requireNonNull(setOn, "setOn");
    }

    /** {@code label of set_on on wall}, for messages. */
    @Override
    public String toString() {
        return label + " of " + setOn + " on " + wall + " (" + gym + ")";
    }
}
