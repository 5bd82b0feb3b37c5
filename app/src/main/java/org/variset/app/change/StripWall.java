package org.variset.app.change;

import java.time.LocalDate;
import org.variset.app.Workspace;
import org.variset.archive.change.WallStrip;

/** A wall was reset: its routes still up from before the day come down that day; the day's new set stays. */
public final class StripWall {
    private final Workspace workspace;

    /** Strips walls of a workspace's archive. */
    public StripWall(Workspace workspace) {
        this.workspace = workspace;
    }

    /**
     * Strips a wall on a day.
     *
     * @param gym the gym, or null when the archive holds one
     * @throws IllegalArgumentException for an unknown gym or wall
     */
    public WallStrip.Result strip(String gym, String wall, LocalDate on) {
        return workspace.write(tx -> WallStrip.strip(tx, gym, wall, on));
    }
}
