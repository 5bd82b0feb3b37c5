package org.variset.cli;

/**
 * What Variset's exit status means. Scripts can rely on these numbers; the README lists them.
 */
public enum ExitCode {
    /** The command did what was asked. */
    OK(0),
    /** Bad input: a file, grade, date or value that cannot be read. The message says where and why. */
    BAD_INPUT(1),
    /** Bad usage: an unknown option or command, a missing argument (picocli's own code for it). */
    USAGE(2),
    /** The archive is missing, in use, damaged, or newer than this Variset. */
    ARCHIVE(3),
    /** A fault inside Variset; {@code --verbose} shows the stack trace for a report. */
    INTERNAL(70);

    private final int code;

    ExitCode(int code) {
        this.code = code;
    }

    /** The process exit status. */
    public int code() {
        return code;
    }
}
