package org.variset.archive.problem;

/**
 * A problem with the archive itself, as opposed to bad input: missing, already there, in use, written by a
 * newer Variset, damaged, or a migration that failed. The message says what is wrong; the {@link #remedy()} what can
 * be done, for each front end to word.
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
    private final transient Remedy remedy;

    /** An archive problem, with what can be done about it. */
    public ArchiveException(Problem problem, String message, Remedy remedy, Throwable cause) {
        super(message, cause);
        this.problem = problem;
        this.remedy = remedy;
    }

    /** An archive problem whose message says all there is to do. */
    public ArchiveException(Problem problem, String message, Throwable cause) {
        this(problem, message, Remedy.NONE, cause);
    }

    /** An archive problem whose message says all there is to do. */
    public ArchiveException(Problem problem, String message) {
        this(problem, message, Remedy.NONE, null);
    }

    /** What can be done about it. */
    public Remedy remedy() {
        return remedy;
    }

    /** What went wrong. */
    public Problem problem() {
        return problem;
    }
}
