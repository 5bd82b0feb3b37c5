package org.variset.app.names;

import java.util.List;
import org.variset.app.Workspace;
import org.variset.archive.read.ArchiveCatalog;
import org.variset.archive.read.GymRecord;

/** The gyms the archive holds, by name. */
public final class ListGyms {
    private final Workspace workspace;

    /** Lists over a workspace's archive. */
    public ListGyms(Workspace workspace) {
        this.workspace = workspace;
    }

    /** The gyms' names, in order. */
    public List<String> names() {
        return new ArchiveCatalog(workspace.archive().connection())
                .gyms().stream().map(GymRecord::name).toList();
    }
}
