package org.variset.web.security;

import io.javalin.http.Context;
import io.javalin.http.HandlerType;
import io.javalin.security.RouteRole;
import java.util.Optional;
import java.util.function.Function;
import org.variset.app.account.Account;

/**
 * Runs before every matched request: sets the security headers, finds the session and its account (read again on
 * every request, so a removed account or a changed role counts at once), checks the role the route needs, and checks
 * the CSRF token of every request that is not a GET or HEAD. A route registered without a {@link Need} is refused.
 */
public final class Guard {
    /** The request attribute that holds the signed-in account. */
    public static final String ACCOUNT = "variset.account";
    /** The request attribute that holds the session. */
    public static final String SESSION = "variset.session";
    /** The form field, or header, that carries the CSRF token. */
    public static final String CSRF_FIELD = "csrf";

    public static final String CSRF_HEADER = "X-CSRF-Token";

    private final Sessions sessions;
    private final Function<String, Optional<Account>> accounts;

    /** A guard over the server's sessions and a way to read an account by name. */
    public Guard(Sessions sessions, Function<String, Optional<Account>> accounts) {
        this.sessions = sessions;
        this.accounts = accounts;
    }

    /** Checks one request; throws a {@link Refusal} or a {@link SignInRedirect} when it may not go on. */
    public void check(Context ctx) {
        headers(ctx);
        Need need = need(ctx);
        if (need == Need.NOBODY) {
            return;
        }
        String id = ctx.cookie(Sessions.COOKIE);
        Optional<WebSession> session = sessions.find(id);
        if (session.isEmpty()) {
            throw new SignInRedirect(ctx.method() == HandlerType.GET ? pathWithQuery(ctx) : "/", id != null);
        }
        Optional<Account> account = accounts.apply(session.get().account());
        if (account.isEmpty()) {
            sessions.end(session.get().id());
            throw new SignInRedirect("/", true);
        }
        ctx.attribute(SESSION, session.get());
        ctx.attribute(ACCOUNT, account.get());
        if (!account.get().may(need.role())) {
            throw new Refusal(
                    403,
                    "Not for your role",
                    "This needs the " + need.role().label().toLowerCase(java.util.Locale.ROOT) + " role or above; your "
                            + "account is " + account.get().role().label().toLowerCase(java.util.Locale.ROOT)
                            + ". Ask an admin if you need it. Nothing was changed.");
        }
        if (changesState(ctx)) {
            checkCsrf(ctx, session.get().csrf());
        }
    }

    /** Refuses a state-changing request whose token is missing or wrong. */
    public static void checkCsrf(Context ctx, String expected) {
        String sent = ctx.header(CSRF_HEADER);
        if (sent == null) {
            sent = ctx.formParam(CSRF_FIELD);
        }
        if (!Tokens.same(sent, expected)) {
            throw new Refusal(
                    403,
                    "Form expired",
                    "This request did not carry the page's security token (it may have come from another site, or "
                            + "the page is old). Go back, reload the page and try again. Nothing was changed.");
        }
    }

    static boolean changesState(Context ctx) {
        return ctx.method() != HandlerType.GET && ctx.method() != HandlerType.HEAD;
    }

    private static Need need(Context ctx) {
        for (RouteRole r : ctx.routeRoles()) {
            if (r instanceof Need n) {
                return n;
            }
        }
        throw new Refusal(404, "Not found", "There is no page at " + ctx.path() + ".");
    }

    private static String pathWithQuery(Context ctx) {
        String q = ctx.queryString();
        return q == null ? ctx.path() : ctx.path() + "?" + q;
    }

    private static void headers(Context ctx) {
        ctx.header(
                "Content-Security-Policy",
                "default-src 'self'; img-src 'self' data:; style-src 'self'; script-src 'self'; object-src 'none'; "
                        + "base-uri 'none'; frame-ancestors 'none'; form-action 'self'");
        ctx.header("X-Content-Type-Options", "nosniff");
        ctx.header("Referrer-Policy", "same-origin");
        ctx.header("X-Frame-Options", "DENY");
        if (!ctx.path().startsWith("/static/")) {
            ctx.header("Cache-Control", "no-store");
        }
    }

    /** The signed-in account of a request the guard let through. */
    public static Account account(Context ctx) {
        return ctx.attribute(ACCOUNT);
    }

    /** The session of a request the guard let through. */
    public static WebSession session(Context ctx) {
        return ctx.attribute(SESSION);
    }
}
