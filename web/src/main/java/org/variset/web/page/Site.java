package org.variset.web.page;

import io.javalin.http.Context;
import java.time.Clock;
import java.util.Map;
import org.variset.app.account.Account;
import org.variset.web.ArchiveGate;
import org.variset.web.Views;
import org.variset.web.security.Guard;
import org.variset.web.security.Refusal;
import org.variset.web.security.Sessions;
import org.variset.web.security.SignInLimiter;

/**
 * What the pages share: the archive's gate, the templates, the sessions and the sign-in limiter.
 *
 * @param gate the archive, one request at a time
 * @param views the templates
 * @param sessions the signed-in sessions
 * @param limiter the sign-in rate limit
 * @param secure true when served over TLS (cookies are then Secure)
 * @param clock the server's clock
 */
public record Site(
        ArchiveGate gate, Views views, Sessions sessions, SignInLimiter limiter, boolean secure, Clock clock) {

    /** Renders a template with the request's frame. */
    public void page(Context ctx, String template, String title, String key, Object view) {
        views.render(ctx, template, Map.of("frame", Frame.of(ctx, title), key, view));
    }

    /** A required query parameter, or a refusal that names it. */
    public static String param(Context ctx, String name) {
        String v = ctx.queryParam(name);
        if (v == null || v.isBlank()) {
            v = ctx.formParam(name);
        }
        if (v == null || v.isBlank()) {
            throw new Refusal(
                    400,
                    "Something is missing",
                    "This page needs '" + name + "' in its address. Follow a "
                            + "link from the overview instead of typing the address.");
        }
        return v;
    }

    /** Refuses a gym the account is limited away from. */
    public static void reach(Context ctx, String gym) {
        Account a = Guard.account(ctx);
        if (!a.reaches(gym)) {
            throw new Refusal(
                    403,
                    "Not your gym",
                    "Your account is limited to " + String.join(", ", a.gyms()) + ". Ask an admin if you need " + gym
                            + ".");
        }
    }
}
