package org.variset.app.change;

import org.variset.app.Workspace;
import org.variset.archive.change.RouteRemoval;

/**
 * Takes back a mistaken import: a reset's routes, or the routes a file lists, with their holds. {@link #preview}
 * says what would go, so that a front end asks before {@link #remove}.
 */
public final class RemoveRoutes {
    private final Workspace workspace;

    /** Removes routes of a workspace's archive. */
    public RemoveRoutes(Workspace workspace) {
        this.workspace = workspace;
    }

    /** What taking the target back would remove; nothing is changed. */
    public RouteRemoval.Plan preview(RouteRemoval.Target target) {
        return workspace.archive().write(tx -> RouteRemoval.preview(tx, target));
    }

    /** Removes the target's routes, their holds and the resets they empty. */
    public RouteRemoval.Plan remove(RouteRemoval.Target target) {
        return workspace.write(tx -> RouteRemoval.remove(tx, target));
    }
}
