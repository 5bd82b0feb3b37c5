package org.variset.web.security;

import java.time.Clock;
import java.time.Duration;
import java.time.Instant;
import java.util.ArrayDeque;
import java.util.Deque;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;

/**
 * Limits failed sign-ins: after {@link #maxFailures} failures within {@link #window}, for one account name or from
 * one address, further attempts for it are refused until the oldest failure leaves the window, before any password
 * is checked. A success clears the account's count (not the address's).
 */
public final class SignInLimiter {
    private final Clock clock;
    private final int maxFailures;
    private final Duration window;
    private final Map<String, Deque<Instant>> failures = new ConcurrentHashMap<>();

    /** A limiter of {@code maxFailures} failures per {@code window}. */
    public SignInLimiter(Clock clock, int maxFailures, Duration window) {
        this.clock = clock;
        this.maxFailures = maxFailures;
        this.window = window;
    }

    /** How long an attempt for this account from this address must wait; zero when it may go ahead. */
    public Duration waitFor(String account, String address) {
        Instant now = clock.instant();
        Duration a = waitOf(accountKey(account), now);
        Duration b = waitOf(addressKey(address), now);
        return a.compareTo(b) >= 0 ? a : b;
    }

    /** Counts a failure against both the account name and the address. */
    public void failed(String account, String address) {
        Instant now = clock.instant();
        for (String key : new String[] {accountKey(account), addressKey(address)}) {
            Deque<Instant> d = failures.computeIfAbsent(key, k -> new ArrayDeque<>());
            synchronized (d) {
                prune(d, now);
                d.addLast(now);
            }
        }
    }

    /** Clears the account's failures after a good sign-in. */
    public void succeeded(String account) {
        failures.remove(accountKey(account));
    }

    private Duration waitOf(String key, Instant now) {
        Deque<Instant> d = failures.get(key);
        if (d == null) {
            return Duration.ZERO;
        }
        synchronized (d) {
            prune(d, now);
            if (d.size() < maxFailures) {
                return Duration.ZERO;
            }
            return Duration.between(now, d.peekFirst().plus(window));
        }
    }

    private void prune(Deque<Instant> d, Instant now) {
        while (!d.isEmpty() && !d.peekFirst().plus(window).isAfter(now)) {
            d.removeFirst();
        }
    }

    private static String accountKey(String account) {
        return "account:" + (account == null ? "" : account.strip().toLowerCase(Locale.ROOT));
    }

    private static String addressKey(String address) {
        return "address:" + address;
    }
}
