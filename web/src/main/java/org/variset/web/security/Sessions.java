package org.variset.web.security;

import java.time.Clock;
import java.time.Duration;
import java.time.Instant;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.ConcurrentHashMap;

/**
 * The signed-in sessions of one server, in memory (a restart signs everyone out). A session ends after
 * {@link #idle} without use, {@link #lifetime} after it began, at sign-out, or when its account is removed.
 */
public final class Sessions {
    /** The cookie that holds a session's id. */
    public static final String COOKIE = "variset_session";

    private final Map<String, WebSession> byId = new ConcurrentHashMap<>();
    private final Clock clock;
    private final Duration idle;
    private final Duration lifetime;

    /**
     * Sessions timed by a clock.
     *
     * @param idle how long a session lasts unused
     * @param lifetime how long a session lasts at most
     */
    public Sessions(Clock clock, Duration idle, Duration lifetime) {
        this.clock = clock;
        this.idle = idle;
        this.lifetime = lifetime;
    }

    /** A new session for an account. */
    public WebSession start(String account) {
        Instant now = clock.instant();
        WebSession s = new WebSession(Tokens.next(), account, Tokens.next(), now, now);
        byId.put(s.id(), s);
        return s;
    }

    /** The live session of an id, marked as used now; empty (and forgotten) when it has ended. */
    public Optional<WebSession> find(String id) {
        if (id == null) {
            return Optional.empty();
        }
        WebSession s = byId.get(id);
        if (s == null) {
            return Optional.empty();
        }
        Instant now = clock.instant();
        if (now.isAfter(s.lastSeen().plus(idle)) || now.isAfter(s.started().plus(lifetime))) {
            byId.remove(id);
            return Optional.empty();
        }
        WebSession seen = s.seenAt(now);
        byId.put(id, seen);
        return Optional.of(seen);
    }

    /** Ends a session. */
    public void end(String id) {
        if (id != null) {
            byId.remove(id);
        }
    }

    /** Ends every session of an account (its password changed, or it was removed). */
    public void endAllOf(String account) {
        byId.values().removeIf(s -> s.account().equals(account));
    }

    /** How long a session lasts at most, for the cookie's lifetime. */
    public Duration lifetime() {
        return lifetime;
    }
}
