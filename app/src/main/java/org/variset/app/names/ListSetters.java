package org.variset.app.names;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.List;
import org.variset.app.Json;
import org.variset.app.Workspace;
import org.variset.archive.read.ArchiveCatalog;
import org.variset.archive.read.GymRecord;
import org.variset.archive.read.NameListings;

/** The setters who set in a gym, with how many routes and when. */
public final class ListSetters {
    private final Workspace workspace;

    /** Lists from a workspace's archive. */
    public ListSetters(Workspace workspace) {
        this.workspace = workspace;
    }

    /**
     * The setters.
     *
     * @param gym the gym's name
     * @param setters the setters, by name
     */
    public record Result(String gym, List<NameListings.SetterLine> setters) {
        /** The result for scripts. */
        public ObjectNode json() {
            ObjectNode o = Json.object().put("gym", gym);
            ArrayNode a = o.putArray("setters");
            setters.forEach(s -> a.addObject()
                    .put("setter", s.name())
                    .put("routes", s.routes())
                    .put("first_set_on", Json.date(s.firstSetOn()))
                    .put("last_set_on", Json.date(s.lastSetOn())));
            return o;
        }
    }

    /**
     * Lists a gym's setters.
     *
     * @param gym the gym, or null when the archive holds one
     */
    public Result list(String gym) {
        GymRecord g = new ArchiveCatalog(workspace.archive().connection()).gym(gym);
        return new Result(g.name(), new NameListings(workspace.archive().connection()).setters(g.id()));
    }
}
