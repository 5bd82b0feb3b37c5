package org.variset.archive.problem;

import java.util.Objects;

/**
 * Bad input from a person: a name the archive does not hold, a value that cannot be read, a file that is in the
 * way. The message says what is wrong without naming any front end's controls; the {@link #remedy()} says what can
 * be done, for each front end to word.
 */
public final class InputException extends IllegalArgumentException {
    private static final long serialVersionUID = 1L;

    /** What kind of bad input, for front ends that answer by kind (the web's status codes). */
    public enum Reason {
        /** A name or value the archive does not hold. */
        NOT_FOUND,
        /** Something already there, in the way (a file, a name). */
        EXISTS,
        /** A name that fits more than one thing. */
        AMBIGUOUS,
        /** A value that is not of the expected form, or options that do not go together. */
        INVALID
    }

    private final Reason reason;
    private final transient Remedy remedy;

    /** Bad input with a remedy. */
    public InputException(Reason reason, String message, Remedy remedy) {
        super(message);
        this.reason = Objects.requireNonNull(reason, "reason");
        this.remedy = Objects.requireNonNull(remedy, "remedy");
    }

    /** Bad input with nothing to suggest beyond the message. */
    public InputException(Reason reason, String message) {
        this(reason, message, Remedy.NONE);
    }

    /** What kind of bad input. */
    public Reason reason() {
        return reason;
    }

    /** What the person can do about it. */
    public Remedy remedy() {
        return remedy;
    }
}
