package org.variset.app.change;

import java.time.LocalDate;
import org.variset.app.Workspace;
import org.variset.archive.change.RouteCorrection;

/**
 * Corrects one route's fields without re-importing a file; moves and styles are read with the gym's vocabulary of
 * the day the route was set, as an import reads them.
 */
public final class AmendRoute {
    private final Workspace workspace;

    /** Corrects routes of a workspace's archive. */
    public AmendRoute(Workspace workspace) {
        this.workspace = workspace;
    }

    /**
     * Applies a correction to the route a gym, wall, label and set date name.
     *
     * @param gym the gym, or null when the archive holds one
     * @return what changed; nothing when the correction gives no field
     * @throws IllegalArgumentException for an unknown route, or a bad grade, date or value
     */
    public RouteCorrection.Result amend(
            String gym, String wall, String label, LocalDate setOn, RouteCorrection correction) {
        return workspace.write(tx -> correction.apply(tx, gym, wall, label, setOn));
    }
}
