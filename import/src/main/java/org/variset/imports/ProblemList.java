package org.variset.imports;

import java.util.ArrayList;
import java.util.List;

/**
 * The problems of one run: every one is counted, the first {@link #SHOWN} are kept to be shown.
 */
public final class ProblemList {
    /** How many problems are kept to be shown; the rest are counted. */
    public static final int SHOWN = 50;

    private final List<Problem> shown = new ArrayList<>();
    private long count;

    /** Adds a problem. */
    public void add(Problem p) {
        count++;
        if (shown.size() < SHOWN) {
            shown.add(p);
        }
    }

    /** Adds a problem. */
    public void add(String file, int line, String column, String message) {
        add(new Problem(file, line, column, message));
    }

    /** True when there is none. */
    public boolean isEmpty() {
        return count == 0;
    }

    /** How many problems in all. */
    public long count() {
        return count;
    }

    /** The first problems, in the order met. */
    public List<Problem> shown() {
        return List.copyOf(shown);
    }

    /** The problems as lines, with a last line counting those not shown. */
    public List<String> lines() {
        List<String> out = new ArrayList<>();
        shown.forEach(p -> out.add(p.toString()));
        if (count > shown.size()) {
            out.add("... and " + (count - shown.size()) + " more problems");
        }
        return out;
    }
}
