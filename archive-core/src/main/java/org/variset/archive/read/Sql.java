package org.variset.archive.read;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.util.ArrayList;
import java.util.List;
import org.variset.archive.problem.ArchiveException;

/** Plain JDBC with positional parameters; a failing statement becomes an archive problem naming the cause. */
final class Sql {
    private Sql() {}

    /** One row turned into a value. */
    @FunctionalInterface
    interface RowMapper<T> {
        T map(ResultSet rs) throws SQLException;
    }

    /** One row handed to a consumer. */
    @FunctionalInterface
    interface RowConsumer {
        void accept(ResultSet rs) throws SQLException;
    }

    /** Every row mapped, nulls included, in result order. */
    static <T> List<T> query(Connection c, String sql, List<Object> params, RowMapper<T> mapper) {
        List<T> out = new ArrayList<>();
        forEach(c, sql, params, rs -> out.add(mapper.map(rs)));
        return out;
    }

    /** Hands every row to the consumer. */
    static void forEach(Connection c, String sql, List<Object> params, RowConsumer consumer) {
        try (PreparedStatement s = c.prepareStatement(sql)) {
            for (int i = 0; i < params.size(); i++) {
                s.setObject(i + 1, params.get(i));
            }
            try (ResultSet rs = s.executeQuery()) {
                while (rs.next()) {
                    consumer.accept(rs);
                }
            }
        } catch (SQLException e) {
            throw new ArchiveException(
                    ArchiveException.Problem.DAMAGED,
                    "Cannot read the archive: " + e.getMessage(),
                    org.variset.archive.problem.Remedy.of(org.variset.archive.problem.Remedy.Kind.CHECK_ARCHIVE),
                    e);
        }
    }
}
