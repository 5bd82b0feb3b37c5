package org.variset.web.page;

import io.javalin.http.Context;
import org.variset.app.account.Account;
import org.variset.app.account.Role;
import org.variset.web.security.Guard;

/**
 * What every page's frame shows: its title, who is signed in, and the CSRF token its forms carry.
 *
 * @param title the page's title
 * @param account the account's name, or null on the sign-in page
 * @param role the account's role in words, or null
 * @param csrf the session's CSRF token, or the sign-in form's
 * @param setter true when the account may import and amend
 * @param headSetter true when the account may strip, remove and change settings
 */
public record Frame(String title, String account, String role, String csrf, boolean setter, boolean headSetter) {
    /** The frame of a signed-in request. */
    public static Frame of(Context ctx, String title) {
        Account a = Guard.account(ctx);
        return new Frame(
                title,
                a.name(),
                a.role().label(),
                Guard.session(ctx).csrf(),
                a.may(Role.SETTER),
                a.may(Role.HEAD_SETTER));
    }
}
