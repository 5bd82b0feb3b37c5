package org.variset.app.change;

import org.variset.app.Workspace;
import org.variset.archive.change.SetterChanges;

/** Fixes a setter's name across the archive: a rename, or two names of one person merged. */
public final class SetterNames {
    private final Workspace workspace;

    /** Fixes names in a workspace's archive. */
    public SetterNames(Workspace workspace) {
        this.workspace = workspace;
    }

    /**
     * Renames a setter on every route.
     *
     * @throws IllegalArgumentException when the old name is unknown, or the new one is taken (merge instead)
     */
    public void rename(String from, String to) {
        workspace.write(tx -> {
            SetterChanges.rename(tx, from, to);
            return null;
        });
    }

    /**
     * Gives every route of one setter to another and removes the first.
     *
     * @return how many routes changed
     * @throws IllegalArgumentException when a name is unknown, or both are the same setter
     */
    public int merge(String from, String into) {
        return workspace.write(tx -> SetterChanges.merge(tx, from, into));
    }
}
