package org.variset.web.security;

/**
 * A request the server will not serve, with the status and the words the person reads: a page for a browser, JSON
 * for a script. Never a stack trace.
 */
public final class Refusal extends RuntimeException {
    private static final long serialVersionUID = 1L;

    private final int status;
    private final String title;

    /** A refusal with an HTTP status, a short title and a sentence saying what to do. */
    public Refusal(int status, String title, String message) {
        super(message);
        this.status = status;
        this.title = title;
    }

    /** The HTTP status. */
    public int status() {
        return status;
    }

    /** The page's title. */
    public String title() {
        return title;
    }
}
