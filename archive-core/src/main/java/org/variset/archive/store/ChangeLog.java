package org.variset.archive.store;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import org.hibernate.Session;

/**
 * The log of changed routes (table {@code route_change}, schema version 2). Every change to a route, its holds or
 * its setters records the route in the same transaction as the change, so that derived data (the search index)
 * catches up from the changes it has not seen. The newest id is the archive's change stamp.
 */
public final class ChangeLog {
    private static final int CHUNK = 500;

    private ChangeLog() {
    }

    /** Records routes by id; call before deleting them (a deleted route is recorded so its document goes too). */
    public static void routes(Session s, Collection<Long> routeIds) {
        List<Long> ids = new ArrayList<>(routeIds);
        for (int i = 0; i < ids.size(); i += CHUNK) {
            s.createNativeMutationQuery("INSERT INTO route_change (route_id, gym_id) SELECT id, gym_id FROM route"
                    + " WHERE id IN (:ids)").setParameter("ids", ids.subList(i, Math.min(ids.size(), i + CHUNK)))
                    .executeUpdate();
        }
    }

    /** Records every route of one setter (a rename or merge changes them all). */
    public static void setter(Session s, long setterId) {
        s.createNativeMutationQuery("INSERT INTO route_change (route_id, gym_id) SELECT r.id, r.gym_id FROM route r"
                + " JOIN route_setter x ON x.route_id = r.id WHERE x.setter_id = :id").setParameter("id", setterId)
                .executeUpdate();
    }

    /** Records every route of a gym (a change of its vocabulary or bands changes how they are indexed). */
    public static void gym(Session s, long gymId) {
        s.createNativeMutationQuery("INSERT INTO route_change (route_id, gym_id) SELECT id, gym_id FROM route"
                + " WHERE gym_id = :id").setParameter("id", gymId).executeUpdate();
    }

    /** The archive's change stamp: the newest change id, 0 when nothing was ever recorded. */
    public static long stamp(Connection c) {
        try (PreparedStatement s = c.prepareStatement("SELECT COALESCE(MAX(id), 0) FROM route_change");
                ResultSet rs = s.executeQuery()) {
            rs.next();
            return rs.getLong(1);
        } catch (SQLException e) {
            throw new ArchiveException(ArchiveException.Problem.DAMAGED, "Cannot read the archive's change log: "
                    + e.getMessage(), e);
        }
    }

    /** The routes changed after a stamp, up to and including another, each once. */
    public static List<Long> changedBetween(Connection c, long after, long upTo) {
        List<Long> out = new ArrayList<>();
        try (PreparedStatement s = c.prepareStatement("SELECT DISTINCT route_id FROM route_change WHERE id > ?"
                + " AND id <= ? ORDER BY route_id")) {
            s.setLong(1, after);
            s.setLong(2, upTo);
            try (ResultSet rs = s.executeQuery()) {
                while (rs.next()) {
                    out.add(rs.getLong(1));
                }
            }
        } catch (SQLException e) {
            throw new ArchiveException(ArchiveException.Problem.DAMAGED, "Cannot read the archive's change log: "
                    + e.getMessage(), e);
        }
        return out;
    }
}
