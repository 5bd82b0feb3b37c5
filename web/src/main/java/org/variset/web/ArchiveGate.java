package org.variset.web;

import java.util.concurrent.locks.ReentrantLock;
import java.util.function.Function;
import org.variset.app.Workspace;

/**
 * The one workspace the server keeps open, used by one request at a time: the archive holds one connection and its
 * search index one writer, so requests take turns here (fairly, in arrival order). Pages that only render take no
 * turn.
 */
public final class ArchiveGate {
    private final Workspace workspace;
    private final ReentrantLock turn = new ReentrantLock(true);

    /** A gate over a workspace (closed by whoever opened it). */
    public ArchiveGate(Workspace workspace) {
        this.workspace = workspace;
    }

    /** Runs work on the workspace in this request's turn. */
    public <T> T use(Function<Workspace, T> work) {
        turn.lock();
        try {
            return work.apply(workspace);
        } finally {
            turn.unlock();
        }
    }
}
