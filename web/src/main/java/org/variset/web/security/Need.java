package org.variset.web.security;

import io.javalin.security.RouteRole;
import org.variset.app.account.Role;

/**
 * What a route needs: no session at all (the sign-in page, static files), or a signed-in account of at least a role.
 * A route registered without a need is refused to everyone.
 */
public enum Need implements RouteRole {
    NOBODY(null),
    VIEWER(Role.VIEWER),
    SETTER(Role.SETTER),
    HEAD_SETTER(Role.HEAD_SETTER),
    ADMIN(Role.ADMIN);

    private final Role role;

    Need(Role role) {
        this.role = role;
    }

    /** The role needed, or null when no session is needed. */
    public Role role() {
        return role;
    }
}
