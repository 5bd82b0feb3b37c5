package org.variset.archive.changelog;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import java.util.Locale;
import org.hibernate.Session;
import org.variset.archive.problem.ArchiveException;

/**
 * The log of changed routes (table {@code route_change}, schema versions 2 and 4). Every change to a route, its
 * holds or its setters records the route in the same transaction as the change, so that derived data (a search
 * index) catches up from the changes it has not seen. A deleted route is recorded before it goes, so its document
 * goes too.
 *
 * <p>What a reader remembers (its <em>stamp</em>) depends on the database:
 * <ul>
 * <li>Embedded (H2, one process at a time): the newest change id. Ids are drawn in commit order there, since one
 * process writes in one transaction at a time.</li>
 * <li>Shared (PostgreSQL, many clients): ids are drawn when rows are written, not when they commit, so a change with
 * a lower id can commit after a reader has seen a higher one. Each change therefore carries the id of the transaction
 * that made it ({@code pg_current_xact_id()}), and the stamp is the <em>xmin</em> of the reader's snapshot: every
 * transaction below it had ended when the reader looked (PostgreSQL 15 documentation, section 9.27, "Snapshot
 * Information Functions"). A reader with stamp S reads every visible change made by transaction S or later, then
 * keeps the new xmin; a change that was still running is read next time, as its transaction is at or above the new
 * xmin. Changes seen twice are applied twice, which is harmless: a document is rebuilt from the route as it is.</li>
 * </ul>
 */
public final class ChangeLog {
    private static final int CHUNK = 500;
    /** The transaction of the change being written, on PostgreSQL 13 and later (64 bits, with the epoch). */
    private static final String PG_TX = "pg_current_xact_id()::text::bigint";
    /** The oldest transaction running when the reader's snapshot was taken. */
    private static final String PG_XMIN = "SELECT pg_snapshot_xmin(pg_current_snapshot())::text::bigint";

    private ChangeLog() {}

    /** Records routes by id; call before deleting them (a deleted route is recorded so its document goes too). */
    public static void routes(Session s, Collection<Long> routeIds) {
        String tx = txExpression(s);
        List<Long> ids = new ArrayList<>(routeIds);
        for (int i = 0; i < ids.size(); i += CHUNK) {
            s.createNativeMutationQuery("INSERT INTO route_change (route_id, gym_id, tx) SELECT id, gym_id, " + tx
                            + " FROM route WHERE id IN (:ids)")
                    .setParameter("ids", ids.subList(i, Math.min(ids.size(), i + CHUNK)))
                    .executeUpdate();
        }
    }

    /** Records every route of one setter (a rename or merge changes them all). */
    public static void setter(Session s, long setterId) {
        s.createNativeMutationQuery(
                        "INSERT INTO route_change (route_id, gym_id, tx) SELECT r.id, r.gym_id, " + txExpression(s)
                                + " FROM route r JOIN route_setter x ON x.route_id = r.id WHERE x.setter_id = :id")
                .setParameter("id", setterId)
                .executeUpdate();
    }

    /** Records every route of a gym (a change of its vocabulary or bands changes how they are indexed). */
    public static void gym(Session s, long gymId) {
        s.createNativeMutationQuery("INSERT INTO route_change (route_id, gym_id, tx) SELECT id, gym_id, "
                        + txExpression(s) + " FROM route WHERE gym_id = :id")
                .setParameter("id", gymId)
                .executeUpdate();
    }

    private static String txExpression(Session s) {
        return s.doReturningWork(ChangeLog::isShared) ? PG_TX : "NULL";
    }

    /** True when the connection is to a shared archive (PostgreSQL), whose stamps are transaction ids. */
    public static boolean isShared(Connection c) {
        try {
            return c.getMetaData()
                    .getDatabaseProductName()
                    .toLowerCase(Locale.ROOT)
                    .contains("postgres");
        } catch (SQLException e) {
            throw new ArchiveException(
                    ArchiveException.Problem.DAMAGED, "Cannot read the archive: " + e.getMessage(), e);
        }
    }

    /**
     * The stamp a reader keeps once it has applied the changes it can see now: the newest change id (embedded), or
     * the xmin of a snapshot taken now (shared). 0 for an embedded archive that never recorded a change.
     */
    public static long stamp(Connection c) {
        try {
            String sql = isShared(c) ? PG_XMIN : "SELECT COALESCE(MAX(id), 0) FROM route_change";
            try (PreparedStatement s = c.prepareStatement(sql);
                    ResultSet rs = s.executeQuery()) {
                rs.next();
                return rs.getLong(1);
            }
        } catch (SQLException e) {
            throw failure(e);
        }
    }

    /**
     * The routes a reader with stamp {@code after} has not seen, each once, in id order. Read the new stamp with
     * {@link #stamp} <em>before</em> this, so that nothing that commits in between is missed.
     *
     * @param after the stamp the reader had
     * @param upTo the stamp it will keep (embedded: the newest id to read; shared: unused, every visible change
     *     from transaction {@code after} on is read)
     */
    public static List<Long> changedSince(Connection c, long after, long upTo) {
        List<Long> out = new ArrayList<>();
        try {
            boolean shared = isShared(c);
            String sql = shared
                    ? "SELECT DISTINCT route_id FROM route_change WHERE tx >= ? ORDER BY route_id"
                    : "SELECT DISTINCT route_id FROM route_change WHERE id > ? AND id <= ? ORDER BY route_id";
            try (PreparedStatement s = c.prepareStatement(sql)) {
                s.setLong(1, after);
                if (!shared) {
                    s.setLong(2, upTo);
                }
                try (ResultSet rs = s.executeQuery()) {
                    while (rs.next()) {
                        out.add(rs.getLong(1));
                    }
                }
            }
        } catch (SQLException e) {
            throw failure(e);
        }
        return out;
    }

    private static ArchiveException failure(SQLException e) {
        return new ArchiveException(
                ArchiveException.Problem.DAMAGED, "Cannot read the archive's change log: " + e.getMessage(), e);
    }
}
