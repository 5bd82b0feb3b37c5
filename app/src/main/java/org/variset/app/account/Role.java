package org.variset.app.account;

import java.util.Arrays;
import java.util.Locale;
import java.util.stream.Collectors;

/**
 * What an account may do. Each role may do everything the roles before it may, and more:
 *
 * <ul>
 *   <li>{@link #VIEWER}: read and search (trainees, staff);
 *   <li>{@link #SETTER}: also import and amend routes;
 *   <li>{@link #HEAD_SETTER}: also strip walls, remove routes and change settings;
 *   <li>{@link #ADMIN}: also manage accounts.
 * </ul>
 */
public enum Role {
    VIEWER("viewer", "Viewer"),
    SETTER("setter", "Setter"),
    HEAD_SETTER("head_setter", "Head setter"),
    ADMIN("admin", "Admin");

    private final String code;
    private final String label;

    Role(String code, String label) {
        this.code = code;
        this.label = label;
    }

    /** The role as stored and typed: {@code viewer}, {@code setter}, {@code head_setter}, {@code admin}. */
    public String code() {
        return code;
    }

    /** The role in words, for pages. */
    public String label() {
        return label;
    }

    /** True when this role may do what {@code needed} may. */
    public boolean includes(Role needed) {
        return ordinal() >= needed.ordinal();
    }

    /**
     * The role a code names; "head-setter" and "head setter" are taken too.
     *
     * @throws IllegalArgumentException naming the roles there are
     */
    public static Role of(String code) {
        String c = code.strip().toLowerCase(Locale.ROOT).replace('-', '_').replace(' ', '_');
        for (Role r : values()) {
            if (r.code.equals(c)) {
                return r;
            }
        }
        throw new IllegalArgumentException("There is no role '" + code + "'. The roles are " + codes() + ".");
    }

    /** The codes, in order, for messages and help. */
    public static String codes() {
        return Arrays.stream(values()).map(Role::code).collect(Collectors.joining(", "));
    }
}
