package org.variset.archive.bulk;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.util.ArrayDeque;
import java.util.HashMap;
import java.util.Map;
import org.variset.archive.changelog.ChangeLog;

/**
 * Ids from the archive's sequences, handed out as Hibernate's pooled optimizer hands them out (every sequence steps
 * by {@link #BLOCK}): a sequence value {@code v} is the top of the block {@code v-49 .. v}, and the sequence's first
 * value 1 is a block of its own. Both can therefore draw from the same sequence without ever giving one id twice.
 */
public final class IdBlocks implements AutoCloseable {
    /** The step of every id sequence (the migrations' {@code INCREMENT BY}, the entities' allocation size). */
    public static final int BLOCK = 50;

    /** Sequence values drawn per round trip (each the top of a block), so 1,000 ids cost one query. */
    static final int VALUES_PER_QUERY = 20;

    private final Connection connection;
    private final boolean postgres;
    private final Map<String, long[]> blocks = new HashMap<>();
    private final Map<String, ArrayDeque<Long>> drawn = new HashMap<>();
    private final Map<String, PreparedStatement> queries = new HashMap<>();

    /** Ids drawn through a connection (in its transaction). */
    public IdBlocks(Connection connection) throws SQLException {
        this.connection = connection;
        this.postgres = ChangeLog.isShared(connection);
    }

    /** The next id of a sequence ({@code route_seq}, {@code hold_seq}, ...). */
    public long next(String sequence) throws SQLException {
        long[] b = blocks.get(sequence);
        if (b == null || b[0] > b[1]) {
            long hi = nextValue(sequence);
            b = new long[] {hi == 1 ? 1 : hi - BLOCK + 1, hi};
            blocks.put(sequence, b);
        }
        return b[0]++;
    }

    private long nextValue(String sequence) throws SQLException {
        ArrayDeque<Long> values = drawn.computeIfAbsent(sequence, k -> new ArrayDeque<>());
        if (values.isEmpty()) {
            try (ResultSet r = query(sequence).executeQuery()) {
                while (r.next()) {
                    values.add(r.getLong(1));
                }
            }
        }
        return values.remove();
    }

    private PreparedStatement query(String sequence) throws SQLException {
        PreparedStatement q = queries.get(sequence);
        if (q == null) {
            if (!sequence.matches("[a-z_]+")) {
                throw new IllegalArgumentException("not a sequence name: " + sequence);
            }
            q = connection.prepareStatement(
                    postgres
                            ? "SELECT nextval('" + sequence + "') FROM generate_series(1, " + VALUES_PER_QUERY + ")"
                            : "SELECT NEXT VALUE FOR " + sequence + " FROM SYSTEM_RANGE(1, " + VALUES_PER_QUERY + ")");
            queries.put(sequence, q);
        }
        return q;
    }

    /** Closes the prepared queries (the connection stays open). */
    @Override
    public void close() throws SQLException {
        for (PreparedStatement q : queries.values()) {
            q.close();
        }
        queries.clear();
    }
}
