package org.variset.imports.load;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import org.variset.archive.read.RouteRecord;
import org.variset.imports.row.RouteRow;

/** What differs between a route row and the route the archive holds under the same key. */
final class RouteDiff {
    private RouteDiff() {}

    /** The differences as {@code field: archive -> file}; empty when the row matches. */
    static List<String> between(RouteRecord r, RouteRow row) {
        List<String> d = new ArrayList<>();
        compare(d, "discipline", r.discipline().word(), row.discipline().word());
        compare(
                d,
                "grade",
                r.gradeText() + " (" + r.gradeScale().word() + ")",
                row.grade().text().strip() + " (" + row.grade().scale().word() + ")");
        // An empty strip date in a file means "not given": a route stripped in the archive (by strip, say) stays down.
        // Putting a route back up is an explicit act (amend --still-up), never a side effect of re-importing a sheet.
        if (row.strippedOn() != null) {
            compare(d, "stripped_on", r.strippedOn(), row.strippedOn());
        }
        compare(d, "reset", r.reset(), row.reset());
        compare(d, "setters", r.setters(), row.setters());
        compare(d, "color", r.color(), row.color());
        compare(d, "angle_deg", r.ownAngleDeg(), row.angleDeg());
        compare(d, "moves", r.moves(), row.moves());
        compare(d, "styles", r.styles(), row.styles());
        compare(d, "move_difficulty", r.moveDifficulty(), row.moveDifficulty());
        compare(d, "notes", r.notes(), row.notes());
        compare(d, "extra fields", r.extraFields(), row.extraFields());
        return d;
    }

    private static void compare(List<String> out, String field, Object archive, Object file) {
        if (!Objects.equals(archive, file)) {
            out.add(field + ": " + show(archive) + " -> " + show(file));
        }
    }

    private static String show(Object v) {
        return v == null ? "(empty)" : v.toString();
    }
}
