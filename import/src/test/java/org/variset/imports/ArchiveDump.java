package org.variset.imports;

import java.util.ArrayList;
import java.util.List;
import org.variset.archive.gym.Wall;
import org.variset.archive.route.HoldPlacement;
import org.variset.archive.route.Route;
import org.variset.archive.route.Setter;
import org.variset.archive.store.Archive;

/** Everything an archive holds, one line per wall, route and hold, ids left out: for round-trip comparisons. */
final class ArchiveDump {
    private ArchiveDump() {}

    static List<String> of(Archive archive) {
        return archive.fromTransaction(s -> {
            List<String> out = new ArrayList<>();
            for (Wall w : s.createSelectionQuery("from Wall order by gym.name, name", Wall.class)
                    .getResultList()) {
                out.add("wall " + w.gym().name() + "|" + w.name() + "|" + w.discipline() + "|" + w.angleDeg() + "|"
                        + w.heightM() + "|" + w.widthM() + "|" + w.cycleDays() + "|" + w.extraFields());
            }
            for (Route r : s.createSelectionQuery("from Route order by gym.name, wall.name, label, setOn", Route.class)
                    .getResultList()) {
                out.add("route " + r.gym().name() + "|" + r.wall().name() + "|" + r.label() + "|" + r.setOn() + "|"
                        + r.discipline() + "|" + r.gradeText() + "|" + r.gradeScale() + "|" + r.gradeIrcra() + "|"
                        + r.strippedOn() + "|" + r.reset().label() + "|"
                        + r.reset().resetOn() + "|"
                        + r.setters().stream().map(Setter::name).toList() + "|" + r.color() + "|" + r.angleDeg()
                        + "|" + r.moves() + "|" + r.styles() + "|" + r.moveDifficulty() + "|" + r.notes() + "|"
                        + r.extraFields());
                for (HoldPlacement h : r.holds()) {
                    out.add("  hold " + h.ordinal() + "|" + h.spec());
                }
            }
            return out;
        });
    }
}
