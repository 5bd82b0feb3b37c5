package org.variset.archive.store;

/**
 * A problem with the archive itself, as opposed to bad input: missing, already there, in use, written by a
 * newer Variset, damaged, or a migration that failed. The message says what to do.
 */
public final class ArchiveException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    /** What went wrong. */
    public enum Problem {
        /** No archive at the location. */
        MISSING,
        /** An archive is already at the location (when creating one). */
        EXISTS,
        /** Another process holds the archive open. */
        IN_USE,
        /** The archive's schema is newer than this Variset knows. */
        TOO_NEW,
        /** A migration failed, or the archive cannot be read. */
        DAMAGED
    }

    private final Problem problem;

    /** An archive problem with a message that says what to do. */
    public ArchiveException(Problem problem, String message, Throwable cause) {
        super(message, cause);
        this.problem = problem;
    }

    /** An archive problem with a message that says what to do. */
    public ArchiveException(Problem problem, String message) {
        this(problem, message, null);
    }

    /** What went wrong. */
    public Problem problem() {
        return problem;
    }
}
