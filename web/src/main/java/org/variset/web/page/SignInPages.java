package org.variset.web.page;

import io.javalin.config.RoutesConfig;
import io.javalin.http.Context;
import io.javalin.http.Cookie;
import io.javalin.http.SameSite;
import java.time.Duration;
import java.util.HashMap;
import java.util.Map;
import java.util.Optional;
import org.variset.app.account.Account;
import org.variset.app.account.Accounts;
import org.variset.web.security.Guard;
import org.variset.web.security.Need;
import org.variset.web.security.Refusal;
import org.variset.web.security.Sessions;
import org.variset.web.security.WebSession;

/**
 * Signing in and out. The sign-in form carries a token that must match a cookie set with the form (no session exists
 * yet to hold one), so another site cannot sign a browser in to an account of its choosing.
 */
public final class SignInPages {
    static final String FORM_COOKIE = "variset_signin";

    private final Site site;

    /** Sign-in pages of a site. */
    public SignInPages(Site site) {
        this.site = site;
    }

    /**
     * The view of the sign-in page.
     *
     * @param next where to go once signed in
     * @param message what went wrong or what happened, or empty
     * @param name the name typed before, or empty
     */
    public record SignInView(String next, String message, String name) {}

    /** Registers the routes. */
    public void register(RoutesConfig r) {
        r.get("/signin", this::form, Need.NOBODY);
        r.post("/signin", this::signIn, Need.NOBODY);
        r.post("/signout", this::signOut, Need.VIEWER);
    }

    private void form(Context ctx) {
        String message = "";
        if (ctx.queryParam("expired") != null) {
            message = "Your session ended. Sign in again.";
        } else if (ctx.queryParam("out") != null) {
            message = "Signed out.";
        }
        show(ctx, safeNext(ctx.queryParam("next")), message, "");
    }

    private void show(Context ctx, String next, String message, String name) {
        String token = org.variset.web.security.FormTokens.next();
        ctx.cookie(cookie(FORM_COOKIE, token, 600));
        Map<String, Object> p = new HashMap<>();
        p.put("frame", new Frame("Sign in", null, null, token, false, false));
        p.put("view", new SignInView(next, message, name));
        site.views().render(ctx, "signin.jte", p);
    }

    private void signIn(Context ctx) {
        String cookieToken = ctx.cookie(FORM_COOKIE);
        if (cookieToken == null) {
            throw new Refusal(
                    403,
                    "Form expired",
                    "The sign-in form was too old, or cookies are off for this site. "
                            + "Reload the sign-in page and try again.");
        }
        Guard.checkCsrf(ctx, cookieToken);
        String name = Optional.ofNullable(ctx.formParam("name")).orElse("").strip();
        String password = Optional.ofNullable(ctx.formParam("password")).orElse("");
        String next = safeNext(ctx.formParam("next"));
        Duration wait = site.limiter().waitFor(name, ctx.ip());
        if (!wait.isZero()) {
            long minutes = Math.max(1, (wait.toSeconds() + 59) / 60);
            ctx.header("Retry-After", Long.toString(Math.max(1, wait.toSeconds())));
            ctx.status(429);
            show(
                    ctx,
                    next,
                    "Too many failed sign-ins for this name or from this address. Try again in " + minutes
                            + (minutes == 1 ? " minute." : " minutes."),
                    name);
            return;
        }
        Optional<Account> account = site.gate().use(w -> new Accounts(w).signIn(name, password.toCharArray()));
        if (account.isEmpty()) {
            site.limiter().failed(name, ctx.ip());
            ctx.status(401);
            show(ctx, next, "That name and password do not match an account.", name);
            return;
        }
        site.limiter().succeeded(name);
        WebSession s = site.sessions().start(account.get().name());
        ctx.cookie(
                cookie(Sessions.COOKIE, s.id(), (int) site.sessions().lifetime().toSeconds()));
        ctx.removeCookie(FORM_COOKIE, "/");
        ctx.redirect(next);
    }

    private void signOut(Context ctx) {
        site.sessions().end(Guard.session(ctx).id());
        ctx.removeCookie(Sessions.COOKIE, "/");
        ctx.redirect("/signin?out");
    }

    private Cookie cookie(String name, String value, int maxAgeSeconds) {
        return new Cookie(name, value, "/", maxAgeSeconds, site.secure(), true, null, SameSite.STRICT);
    }

    /** Only a path on this site: never another host (an open redirect), never back to the sign-in page. */
    static String safeNext(String next) {
        if (next == null
                || !next.startsWith("/")
                || next.startsWith("//")
                || next.startsWith("/\\")
                || next.startsWith("/signin")) {
            return "/";
        }
        return next;
    }
}
