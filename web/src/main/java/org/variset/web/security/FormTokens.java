package org.variset.web.security;

/** Tokens for forms shown before there is a session (the sign-in form). */
public final class FormTokens {
    private FormTokens() {}

    /** A new random token. */
    public static String next() {
        return Tokens.next();
    }
}
