package org.variset.web.security;

import java.time.Instant;

/**
 * A signed-in session, kept on the server; the browser holds only its id.
 *
 * @param id the id in the cookie
 * @param account the account's name
 * @param csrf the token every state-changing request of this session carries
 * @param started when it began (it ends a fixed time after, whatever happens)
 * @param lastSeen when it was last used (it ends after a spell without use)
 */
public record WebSession(String id, String account, String csrf, Instant started, Instant lastSeen) {
    WebSession seenAt(Instant now) {
        return new WebSession(id, account, csrf, started, now);
    }
}
