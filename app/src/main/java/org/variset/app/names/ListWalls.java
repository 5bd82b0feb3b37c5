package org.variset.app.names;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.time.LocalDate;
import java.util.List;
import org.variset.app.Json;
import org.variset.app.Workspace;
import org.variset.archive.read.ArchiveCatalog;
import org.variset.archive.read.GymRecord;
import org.variset.archive.read.NameListings;

/** A gym's walls, with their resets and the routes up on a day. */
public final class ListWalls {
    private final Workspace workspace;

    /** Lists from a workspace's archive. */
    public ListWalls(Workspace workspace) {
        this.workspace = workspace;
    }

    /**
     * The walls.
     *
     * @param gym the gym's name
     * @param on the day the routes up are counted on
     * @param walls the walls, by name
     */
    public record Result(String gym, LocalDate on, List<NameListings.WallLine> walls) {
        /** The result for scripts. */
        public ObjectNode json() {
            ObjectNode o = Json.object().put("gym", gym).put("on", on.toString());
            ArrayNode a = o.putArray("walls");
            walls.forEach(w -> a.addObject()
                    .put("wall", w.name())
                    .put(
                            "discipline",
                            w.discipline() == null ? null : w.discipline().word())
                    .put("angle_deg", w.angleDeg())
                    .put("cycle_days", w.cycleDays())
                    .put("resets", w.resets())
                    .put("last_reset", Json.date(w.lastReset()))
                    .put("routes_up", w.routesUp()));
            return o;
        }
    }

    /**
     * Lists a gym's walls.
     *
     * @param gym the gym, or null when the archive holds one
     * @param on the day, or null for today at the gym
     */
    public Result list(String gym, LocalDate on) {
        GymRecord g = new ArchiveCatalog(workspace.archive().connection()).gym(gym);
        LocalDate day = on != null ? on : workspace.today(g.name());
        return new Result(g.name(), day, new NameListings(workspace.archive().connection()).walls(g.id(), day));
    }
}
