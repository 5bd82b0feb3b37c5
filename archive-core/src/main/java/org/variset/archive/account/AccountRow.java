package org.variset.archive.account;

import java.time.Instant;
import java.util.List;
import java.util.Objects;

/**
 * One account as stored.
 *
 * @param name the account's name, lower case
 * @param role its role's code ({@code viewer}, {@code setter}, {@code head_setter}, {@code admin})
 * @param gyms the gyms it is limited to, or empty for every gym
 * @param passwordHash its password's hash in PHC form; never shown
 * @param createdAt when it was made
 * @param passwordSetAt when its password was last set
 */
public record AccountRow(
        String name, String role, List<String> gyms, String passwordHash, Instant createdAt, Instant passwordSetAt) {
    /** Copies the gym list. */
    public AccountRow {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(role, "role");
        gyms = List.copyOf(gyms);
        Objects.requireNonNull(passwordHash, "passwordHash");
        Objects.requireNonNull(createdAt, "createdAt");
        Objects.requireNonNull(passwordSetAt, "passwordSetAt");
    }

    /** Never prints the hash. */
    @Override
    public String toString() {
        return "AccountRow[" + name + ", " + role + ", gyms=" + gyms + "]";
    }
}
