package org.variset.archive.check;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.variset.archive.changelog.ChangeLog;
import org.variset.archive.read.RouteFilter;
import org.variset.archive.read.RouteReader;
import org.variset.archive.schema.SchemaVersion;
import org.variset.archive.search.SearchIndex;
import org.variset.archive.store.Archive;

/**
 * Checks an archive. The database: its schema version, that every row of every table reads back (the storage engine
 * verifies each page it reads), that nothing refers to a row that is gone, and the rules of the interchange spec that
 * the schema cannot state (a route on its reset's wall, set on or after its reset's day). The index: Lucene's
 * CheckIndex, one document per route with the same ids, and the database's change stamp.
 */
public final class ArchiveCheck {
    private static final String[][] ORPHANS = {
        {"walls without their gym", "SELECT COUNT(*) FROM wall w LEFT JOIN gym g ON g.id = w.gym_id WHERE g.id IS NULL"
        },
        {
            "resets without their wall",
            "SELECT COUNT(*) FROM reset r LEFT JOIN wall w ON w.id = r.wall_id" + " WHERE w.id IS NULL"
        },
        {
            "routes without their reset",
            "SELECT COUNT(*) FROM route r LEFT JOIN reset x ON x.id = r.reset_id" + " WHERE x.id IS NULL"
        },
        {
            "holds without their route",
            "SELECT COUNT(*) FROM hold_placement h LEFT JOIN route r ON r.id = h.route_id" + " WHERE r.id IS NULL"
        },
        {
            "setter links without a setter",
            "SELECT COUNT(*) FROM route_setter x LEFT JOIN setter s" + " ON s.id = x.setter_id WHERE s.id IS NULL"
        },
        {
            "routes on another wall than their reset",
            "SELECT COUNT(*) FROM route r JOIN reset x ON x.id = r.reset_id"
                    + " WHERE x.wall_id <> r.wall_id OR x.gym_id <> r.gym_id"
        },
        {
            "routes set before their reset's day",
            "SELECT COUNT(*) FROM route r JOIN reset x ON x.id = r.reset_id" + " WHERE r.set_on < x.reset_on"
        },
        {
            "routes stripped on or before they were set",
            "SELECT COUNT(*) FROM route WHERE stripped_on IS NOT NULL" + " AND stripped_on <= set_on"
        },
    };
    private static final String[] TABLES = {
        "gym", "wall", "setter", "reset", "route", "route_setter", "hold_placement", "gym_setting", "route_change"
    };

    private ArchiveCheck() {}

    /** Checks the database and the index. */
    public static CheckReport run(Archive archive, SearchIndex index) {
        List<CheckReport.Item> items = new ArrayList<>();
        Connection c = archive.connection();
        SchemaVersion v = archive.schemaVersion();
        items.add(new CheckReport.Item(
                "database",
                "schema version",
                v.version() == SchemaVersion.LATEST && !v.failed(),
                "version " + v.version() + (v.failed() ? ", a migration failed" : "") + " (this Variset: "
                        + SchemaVersion.LATEST + ")"));
        items.add(readsEveryRow(c));
        for (String[] o : ORPHANS) {
            long n = count(c, o[1]);
            items.add(new CheckReport.Item("database", o[0], n == 0, n == 0 ? "none" : n + " found"));
        }
        long routes = count(c, "SELECT COUNT(*) FROM route");
        items.add(readsEveryRoute(c, routes));
        IndexCheck.add(index, c, routes, ChangeLog.stamp(c), items);
        return new CheckReport(items);
    }

    private static CheckReport.Item readsEveryRow(Connection c) {
        List<String> counts = new ArrayList<>();
        try {
            for (String t : TABLES) {
                long n = 0;
                try (PreparedStatement s = c.prepareStatement("SELECT * FROM " + t);
                        ResultSet rs = s.executeQuery()) {
                    int columns = rs.getMetaData().getColumnCount();
                    while (rs.next()) {
                        for (int i = 1; i <= columns; i++) {
                            rs.getObject(i);
                        }
                        n++;
                    }
                }
                counts.add(t + " " + n);
            }
            return new CheckReport.Item("database", "every row reads back", true, String.join(", ", counts));
        } catch (SQLException | RuntimeException e) {
            return new CheckReport.Item("database", "every row reads back", false, "cannot read " + e.getMessage());
        }
    }

    /** Every route with its holds through the read model: JSON columns parse, enums are known. */
    private static CheckReport.Item readsEveryRoute(Connection c, long routes) {
        try {
            long n = new RouteReader(c).forEachChunk(RouteFilter.all(), 2_000, chunk -> {});
            return new CheckReport.Item("database", "every route reads as a route", n == routes, n + " of " + routes);
        } catch (RuntimeException e) {
            return new CheckReport.Item("database", "every route reads as a route", false, e.getMessage());
        }
    }

    static long count(Connection c, String sql) {
        try (PreparedStatement s = c.prepareStatement(sql);
                ResultSet rs = s.executeQuery()) {
            rs.next();
            return rs.getLong(1);
        } catch (SQLException e) {
            return -1;
        }
    }

    /** The ids of every route, for comparing with the index. */
    static Set<Long> routeIds(Connection c) {
        Set<Long> out = new HashSet<>();
        try (PreparedStatement s = c.prepareStatement("SELECT id FROM route");
                ResultSet rs = s.executeQuery()) {
            while (rs.next()) {
                out.add(rs.getLong(1));
            }
        } catch (SQLException e) {
            throw new IllegalStateException(e);
        }
        return out;
    }
}
