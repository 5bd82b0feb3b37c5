package org.variset.imports;

import java.util.List;

/** Input that cannot be imported as it is; nothing was written. The problems say where and why. */
public final class ImportException extends IllegalArgumentException {
    private static final long serialVersionUID = 1L;

    private final transient ProblemList problems;

    /** An import refused for these problems. */
    public ImportException(ProblemList problems) {
        super(problems.count() + (problems.count() == 1 ? " problem" : " problems") + " in the input; nothing "
                + "was imported:\n  " + String.join("\n  ", problems.lines()));
        this.problems = problems;
    }

    /** The problems. */
    public List<Problem> problems() {
        return problems.shown();
    }

    /** How many problems in all. */
    public long count() {
        return problems.count();
    }
}
