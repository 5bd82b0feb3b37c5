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

/** A gym's resets, newest first, of every wall or one. */
public final class ListResets {
    private final Workspace workspace;

    /** Lists from a workspace's archive. */
    public ListResets(Workspace workspace) {
        this.workspace = workspace;
    }

    /**
     * The resets.
     *
     * @param gym the gym's name
     * @param wall the wall asked about, or null for all
     * @param on the day the routes still up are counted on
     * @param resets the resets, newest first
     */
    public record Result(String gym, String wall, LocalDate on, List<NameListings.ResetLine> resets) {
        /** The result for scripts. */
        public ObjectNode json() {
            ObjectNode o = Json.object().put("gym", gym).put("wall", wall).put("on", on.toString());
            ArrayNode a = o.putArray("resets");
            resets.forEach(r -> a.addObject()
                    .put("reset", r.label())
                    .put("wall", r.wall())
                    .put("reset_on", r.resetOn().toString())
                    .put("routes", r.routes())
                    .put("still_up", r.stillUp()));
            return o;
        }
    }

    /**
     * Lists a gym's resets.
     *
     * @param gym the gym, or null when the archive holds one
     * @param wall one wall, or null for all
     * @param on the day, or null for today at the gym
     * @throws IllegalArgumentException naming the walls there are, for an unknown wall
     */
    public Result list(String gym, String wall, LocalDate on) {
        ArchiveCatalog catalog = new ArchiveCatalog(workspace.archive().connection());
        GymRecord g = catalog.gym(gym);
        Long wallId = wall == null ? null : catalog.wall(g, wall).id();
        LocalDate day = on != null ? on : workspace.today(g.name());
        return new Result(
                g.name(),
                wall == null ? null : catalog.wall(g, wall).name(),
                day,
                new NameListings(workspace.archive().connection()).resets(g.id(), wallId, day));
    }
}
