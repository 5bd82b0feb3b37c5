package org.variset.archive.search;

/**
 * A query that cannot be read: where (a 1-based character position) and what was expected there. The message
 * reads {@code at position 14: expected a value after 'grade:'}; {@link #pointer()} shows the query with a caret.
 */
public final class QuerySyntaxException extends IllegalArgumentException {
    private static final long serialVersionUID = 1L;

    private final String query;
    private final int position;

    QuerySyntaxException(String query, int position, String what) {
        super("cannot read the query at position " + position + ": " + what);
        this.query = query;
        this.position = position;
    }

    /** The 1-based position of the problem. */
    public int position() {
        return position;
    }

    /** Two lines: the query, and a caret under the position. */
    public String pointer() {
        return "  " + query + "\n  " + " ".repeat(Math.max(0, position - 1)) + "^";
    }
}
