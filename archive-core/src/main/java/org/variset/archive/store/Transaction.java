package org.variset.archive.store;

import java.sql.Connection;
import java.util.Objects;
import org.hibernate.Session;

/**
 * One write transaction on an archive, as the layers above the archive see it: they pass it to the archive's write
 * operations ({@code archive.change}, {@code SettingsWriter}) and never touch Hibernate themselves. It commits when
 * the work given to {@link Archive#write} returns, and rolls back when that throws.
 */
public final class Transaction {
    private final Session session;
    private final Archive archive;

    Transaction(Session session, Archive archive) {
        this.session = Objects.requireNonNull(session, "session");
        this.archive = Objects.requireNonNull(archive, "archive");
    }

    /** The Hibernate session, for the archive's own write operations and the importer; nothing above them. */
    public Session session() {
        return session;
    }

    /** The archive's read connection, for plain reads beside the writes (settings in effect, say). */
    public Connection readConnection() {
        return archive.connection();
    }
}
