package org.variset.app.account;

import java.time.Instant;
import java.util.List;

/**
 * An account as the front ends see it (never with its password hash).
 *
 * @param name its name, lower case
 * @param role its role
 * @param gyms the gyms it is limited to, or empty for every gym
 * @param createdAt when it was made
 * @param passwordSetAt when its password was last set
 */
public record Account(String name, Role role, List<String> gyms, Instant createdAt, Instant passwordSetAt) {
    /** Copies the gym list. */
    public Account {
        gyms = List.copyOf(gyms);
    }

    /** True when the account may see a gym (every gym when it is limited to none). */
    public boolean reaches(String gym) {
        return gyms.isEmpty() || gyms.stream().anyMatch(g -> g.equalsIgnoreCase(gym));
    }

    /** True when the account may do what a role may. */
    public boolean may(Role needed) {
        return role.includes(needed);
    }
}
