package org.variset.imports.table;

import org.variset.imports.Problem;

/** A file that cannot be read on at all (not UTF-8, not a workbook, broken quoting): one problem for the file. */
public final class InputFileException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    private final transient Problem problem;

    /** A file problem. */
    public InputFileException(Problem problem, Throwable cause) {
        super(problem.toString(), cause);
        this.problem = problem;
    }

    /** The problem. */
    public Problem problem() {
        return problem;
    }
}
