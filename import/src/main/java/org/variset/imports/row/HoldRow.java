package org.variset.imports.row;

import java.time.LocalDate;
import org.variset.archive.route.HoldPlacement;

/**
 * A validated hold row, naming its route by (gym, label, set_on) and, where needed, the wall.
 *
 * @param file where it came from
 * @param line its line
 * @param gym the gym's name
 * @param wall the wall's name, or null when the file leaves it out
 * @param route the route's label
 * @param setOn the route's set date
 * @param spec the placement's values
 */
public record HoldRow(
        String file, int line, String gym, String wall, String route, LocalDate setOn, HoldPlacement.Spec spec) {}
