package org.variset.app.route;

import java.util.List;
import java.util.Optional;
import org.variset.app.Workspace;
import org.variset.archive.read.RouteFilter;
import org.variset.archive.read.RouteReader;
import org.variset.archive.read.RouteRecord;

/** One route with its holds, by its id in the archive (as search results and audits give it). */
public final class ReadRoute {
    private final Workspace workspace;

    /** Reads over a workspace's archive. */
    public ReadRoute(Workspace workspace) {
        this.workspace = workspace;
    }

    /** The route of an id, if the archive holds one. */
    public Optional<RouteRecord> byId(long id) {
        return new RouteReader(workspace.archive().connection())
                .read(RouteFilter.all().withIds(List.of(id))).stream().findFirst();
    }
}
