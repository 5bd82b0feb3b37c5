package org.variset.archive.transfer;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.ResultSetMetaData;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.BiConsumer;
import org.variset.archive.problem.ArchiveException;
import org.variset.archive.problem.ArchiveException.Problem;
import org.variset.archive.store.Archive;

/**
 * Copies every row of an archive into another, empty, archive of the same schema version (an embedded archive into
 * a shared one on PostgreSQL), then proves the copy: each table's row count and a SHA-256 over its rows, read back
 * from the target in the copying transaction, must equal the source's, or nothing is committed.
 *
 * <p>The change log is not copied: it serves indexes of the source, and every client of the target builds its own
 * index on first use. The target keeps its own identity. Id sequences are moved past the copied ids.
 */
public final class ArchiveTransfer {
    /** The tables copied, parents before children, each with the columns that order its rows. */
    static final List<Table> TABLES = List.of(
            new Table("gym", "id", "gym_seq"),
            new Table("wall", "id", "wall_seq"),
            new Table("setter", "id", "setter_seq"),
            new Table("reset", "id", "reset_seq"),
            new Table("route", "id", "route_seq"),
            new Table("route_setter", "route_id, ord", null),
            new Table("hold_placement", "id", "hold_seq"),
            new Table("gym_setting", "id", "gym_setting_seq"),
            new Table("account", "name", null));

    private static final int BATCH = 1_000;
    /** Hibernate's pooled ids take blocks of this many below each sequence value (the migrations' INCREMENT BY). */
    private static final int ID_BLOCK = 50;

    private ArchiveTransfer() {}

    /**
     * A table to copy.
     *
     * @param name its name
     * @param order the columns that order its rows (its primary key)
     * @param sequence the sequence its ids come from, or null
     */
    record Table(String name, String order, String sequence) {}

    /**
     * One table's copy.
     *
     * @param table the table
     * @param rows how many rows (the same on both sides)
     * @param sha256 the SHA-256 of its rows, in key order (the same on both sides)
     */
    public record Copied(String table, long rows, String sha256) {}

    /**
     * Copies {@code from} into {@code to} in one transaction of {@code to}, verified before it commits (the source's
     * digest is taken from the rows as they are copied, the copy's read back in the transaction) and once more after,
     * over a new connection.
     *
     * @param progress told each table's name and rows once it is copied
     * @throws ArchiveException when the target is not empty, the schema versions differ, or the copy does not
     *     verify (before the commit: nothing was committed)
     */
    public static List<Copied> copy(Archive from, Archive to, BiConsumer<String, Long> progress) {
        if (from.schemaVersion().version() != to.schemaVersion().version()) {
            throw new ArchiveException(
                    Problem.DAMAGED,
                    "The archives have different schema versions ("
                            + from.schemaVersion().version() + " and "
                            + to.schemaVersion().version() + "); open both with "
                            + "this Variset first");
        }
        List<Copied> out = new ArrayList<>();
        try (Connection target = to.dataSource().getConnection()) {
            target.setAutoCommit(false);
            try {
                to.takeWriterTurn(target);
                refuseUnlessEmpty(target, to.describe());
                for (Table t : TABLES) {
                    Copied source = copyTable(from.connection(), target, t);
                    moveSequence(target, t);
                    Copied copied = digest(target, t);
                    if (!source.equals(copied)) {
                        throw new ArchiveException(
                                Problem.DAMAGED,
                                "The copy of table " + t.name() + " does not "
                                        + "match its source (source " + source.rows() + " rows, SHA-256 "
                                        + source.sha256()
                                        + "; copy " + copied.rows() + " rows, SHA-256 " + copied.sha256()
                                        + "). Nothing was "
                                        + "committed to " + to.describe() + ".");
                    }
                    out.add(source);
                    progress.accept(t.name(), source.rows());
                }
                target.commit();
            } catch (SQLException | RuntimeException e) {
                target.rollback();
                throw e;
            }
        } catch (SQLException e) {
            throw new ArchiveException(
                    Problem.DAMAGED,
                    "Copying into " + to.describe() + " failed: " + e.getMessage() + ". Nothing was committed.",
                    e);
        }
        checkAgain(to, out);
        return out;
    }

    /** Reads every table of the committed copy again over a new connection and compares it with the source's. */
    private static void checkAgain(Archive to, List<Copied> source) {
        List<Copied> again = new ArrayList<>();
        try (Connection c = to.dataSource().getConnection()) {
            for (Table t : TABLES) {
                again.add(digest(c, t));
            }
        } catch (SQLException e) {
            throw new ArchiveException(Problem.DAMAGED, "Cannot read back " + to.describe() + ": " + e.getMessage(), e);
        }
        if (!again.equals(source)) {
            throw new ArchiveException(
                    Problem.DAMAGED,
                    "The archive at " + to.describe() + " was committed but does "
                            + "not read back as the embedded archive: " + again + " against " + source
                            + ". Drop it and run "
                            + "migrate-to again.");
        }
    }

    private static void refuseUnlessEmpty(Connection c, String where) throws SQLException {
        Map<String, Long> filled = new LinkedHashMap<>();
        for (Table t : TABLES) {
            long n = count(c, t.name());
            if (n > 0) {
                filled.put(t.name(), n);
            }
        }
        if (!filled.isEmpty()) {
            throw new ArchiveException(
                    Problem.EXISTS,
                    "The archive at " + where + " is not empty ("
                            + filled.toString().replaceAll("[{}]", "")
                            + "); migrate-to copies into an empty archive only. Use a new "
                            + "database or schema.");
        }
    }

    private static long count(Connection c, String table) throws SQLException {
        try (Statement s = c.createStatement();
                ResultSet rs = s.executeQuery("SELECT COUNT(*) FROM " + table)) {
            rs.next();
            return rs.getLong(1);
        }
    }

    /** Copies a table's rows in key order, and returns the row count and SHA-256 of what it copied. */
    private static Copied copyTable(Connection source, Connection target, Table t) throws SQLException {
        RowDigest digest = new RowDigest();
        try (Statement s = source.createStatement()) {
            s.setFetchSize(BATCH);
            try (ResultSet rs = s.executeQuery("SELECT * FROM " + t.name() + " ORDER BY " + t.order())) {
                List<String> columns = columns(rs.getMetaData());
                int n = columns.size();
                int[] byName = byName(columns);
                String insert = "INSERT INTO " + t.name() + " (" + String.join(", ", columns) + ") VALUES ("
                        + String.join(", ", java.util.Collections.nCopies(n, "?")) + ")";
                try (PreparedStatement p = target.prepareStatement(insert)) {
                    Object[] row = new Object[n];
                    while (rs.next()) {
                        for (int i = 1; i <= n; i++) {
                            row[i - 1] = rs.getObject(i);
                            p.setObject(i, row[i - 1]);
                        }
                        digest.add(row, byName);
                        p.addBatch();
                        if (digest.rows % BATCH == 0) {
                            p.executeBatch();
                        }
                    }
                    p.executeBatch();
                }
            }
        }
        return digest.of(t);
    }

    private static List<String> columns(ResultSetMetaData md) throws SQLException {
        List<String> out = new ArrayList<>();
        for (int i = 1; i <= md.getColumnCount(); i++) {
            out.add(md.getColumnLabel(i).toLowerCase(java.util.Locale.ROOT));
        }
        return out;
    }

    /** The positions (from 0) of the columns in name order, so that column order in the table does not count. */
    private static int[] byName(List<String> columns) {
        return columns.stream().sorted().mapToInt(columns::indexOf).toArray();
    }

    /** Sets the sequence so that every id Hibernate or the bulk writer draws next is above the copied ones. */
    private static void moveSequence(Connection target, Table t) throws SQLException {
        if (t.sequence() == null) {
            return;
        }
        long max;
        try (Statement s = target.createStatement();
                ResultSet rs = s.executeQuery("SELECT COALESCE(MAX(id), 0) FROM " + t.name())) {
            rs.next();
            max = rs.getLong(1);
        }
        try (Statement s = target.createStatement()) {
            s.execute("ALTER SEQUENCE " + t.sequence() + " RESTART WITH " + (max + ID_BLOCK + 1));
        }
    }

    /**
     * A table's row count and the SHA-256 of its rows in key order, each row as its columns' values in a form that
     * does not depend on the database: numbers as Java prints them, dates as ISO dates, null as a mark of its own.
     */
    static Copied digest(Connection c, Table t) throws SQLException {
        RowDigest digest = new RowDigest();
        try (Statement s = c.createStatement()) {
            s.setFetchSize(BATCH);
            try (ResultSet rs = s.executeQuery("SELECT * FROM " + t.name() + " ORDER BY " + t.order())) {
                int n = rs.getMetaData().getColumnCount();
                int[] byName = byName(columns(rs.getMetaData()));
                Object[] row = new Object[n];
                while (rs.next()) {
                    for (int i = 1; i <= n; i++) {
                        row[i - 1] = rs.getObject(i);
                    }
                    digest.add(row, byName);
                }
            }
        }
        return digest.of(t);
    }

    /** A running SHA-256 over rows, each as its values in column-name order, separated by control characters. */
    private static final class RowDigest {
        private final MessageDigest sha = sha256();
        private final StringBuilder line = new StringBuilder();
        private long rows;

        void add(Object[] row, int[] byName) {
            rows++;
            line.setLength(0);
            for (int i : byName) {
                line.append(text(row[i])).append('\u001f');
            }
            line.append('\u001e');
            sha.update(line.toString().getBytes(StandardCharsets.UTF_8));
        }

        Copied of(Table t) {
            return new Copied(t.name(), rows, HexFormat.of().formatHex(sha.digest()));
        }
    }

    private static String text(Object v) {
        if (v == null) {
            return "\u0000";
        }
        if (v instanceof java.sql.Date d) {
            return d.toLocalDate().toString();
        }
        if (v instanceof Number n && !(v instanceof Double || v instanceof Float)) {
            return Long.toString(n.longValue());
        }
        return v.toString();
    }

    private static MessageDigest sha256() {
        try {
            return MessageDigest.getInstance("SHA-256");
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is missing from this Java", e);
        }
    }
}
