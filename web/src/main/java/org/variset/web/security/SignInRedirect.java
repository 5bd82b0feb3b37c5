package org.variset.web.security;

/** A request without a live session, sent to the sign-in page (which then brings it back to where it was going). */
public final class SignInRedirect extends RuntimeException {
    private static final long serialVersionUID = 1L;

    private final String next;
    private final boolean expired;

    SignInRedirect(String next, boolean expired) {
        super("sign in first", null, false, false);
        this.next = next;
        this.expired = expired;
    }

    /** Where to go once signed in. */
    public String next() {
        return next;
    }

    /** True when a session was there but had ended. */
    public boolean expired() {
        return expired;
    }
}
