package org.variset.archive.account;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.type.TypeReference;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.variset.archive.problem.ArchiveException;
import org.variset.archive.problem.Remedy;

/**
 * Reads and writes the {@code account} table with plain JDBC. Each write is one statement, so it stands or falls
 * whole without a transaction of its own; none of them touches routes, so none enters the change log.
 */
public final class AccountStore {
    private static final ObjectMapper JSON = new ObjectMapper();
    private static final String COLUMNS = "name, role, gyms, password_hash, created_at, password_set_at";

    private final Connection connection;

    /** A store over an archive's connection (it is not closed here). */
    public AccountStore(Connection connection) {
        this.connection = connection;
    }

    /** Every account, by name. */
    public List<AccountRow> all() {
        return query("SELECT " + COLUMNS + " FROM account ORDER BY name", null);
    }

    /** The account of a name (lower case), if there is one. */
    public Optional<AccountRow> find(String name) {
        return query("SELECT " + COLUMNS + " FROM account WHERE name = ?", name).stream()
                .findFirst();
    }

    /** How many accounts have a role. */
    public int countWithRole(String role) {
        try (PreparedStatement s = connection.prepareStatement("SELECT COUNT(*) FROM account WHERE role = ?")) {
            s.setString(1, role);
            try (ResultSet rs = s.executeQuery()) {
                rs.next();
                return rs.getInt(1);
            }
        } catch (SQLException e) {
            throw failed("read", e);
        }
    }

    /** Adds an account; false when the name is taken (nothing is written then). */
    public boolean add(AccountRow a) {
        if (find(a.name()).isPresent()) {
            return false;
        }
        update(
                "INSERT INTO account (" + COLUMNS + ") VALUES (?, ?, ?, ?, ?, ?)",
                a.name(),
                a.role(),
                gymsColumn(a.gyms()),
                a.passwordHash(),
                a.createdAt().toString(),
                a.passwordSetAt().toString());
        return true;
    }

    /** Sets an account's password hash; false when there is no such account. */
    public boolean setPassword(String name, String hash, Instant at) {
        return update(
                        "UPDATE account SET password_hash = ?, password_set_at = ? WHERE name = ?",
                        hash,
                        at.toString(),
                        name)
                == 1;
    }

    /** Sets an account's role and gyms; false when there is no such account. */
    public boolean setRole(String name, String role, List<String> gyms) {
        return update("UPDATE account SET role = ?, gyms = ? WHERE name = ?", role, gymsColumn(gyms), name) == 1;
    }

    /** Removes an account; false when there was none. */
    public boolean remove(String name) {
        return update("DELETE FROM account WHERE name = ?", name) == 1;
    }

    private List<AccountRow> query(String sql, String param) {
        List<AccountRow> out = new ArrayList<>();
        try (PreparedStatement s = connection.prepareStatement(sql)) {
            if (param != null) {
                s.setString(1, param);
            }
            try (ResultSet rs = s.executeQuery()) {
                while (rs.next()) {
                    out.add(new AccountRow(
                            rs.getString(1),
                            rs.getString(2),
                            gymsOf(rs.getString(3)),
                            rs.getString(4),
                            Instant.parse(rs.getString(5)),
                            Instant.parse(rs.getString(6))));
                }
            }
        } catch (SQLException e) {
            throw failed("read", e);
        }
        return out;
    }

    private int update(String sql, String... params) {
        try (PreparedStatement s = connection.prepareStatement(sql)) {
            for (int i = 0; i < params.length; i++) {
                s.setString(i + 1, params[i]);
            }
            return s.executeUpdate();
        } catch (SQLException e) {
            throw failed("write", e);
        }
    }

    private static String gymsColumn(List<String> gyms) {
        if (gyms.isEmpty()) {
            return null;
        }
        try {
            return JSON.writeValueAsString(gyms);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("cannot write gym names as JSON", e);
        }
    }

    private static List<String> gymsOf(String column) {
        if (column == null) {
            return List.of();
        }
        try {
            return JSON.readValue(column, new TypeReference<List<String>>() {});
        } catch (JsonProcessingException e) {
            throw new ArchiveException(
                    ArchiveException.Problem.DAMAGED,
                    "An account's gyms are not a JSON list: " + column,
                    Remedy.of(Remedy.Kind.CHECK_ARCHIVE),
                    e);
        }
    }

    private static ArchiveException failed(String what, SQLException e) {
        return new ArchiveException(
                ArchiveException.Problem.DAMAGED,
                "Cannot " + what + " the archive's accounts: " + e.getMessage(),
                Remedy.of(Remedy.Kind.CHECK_ARCHIVE),
                e);
    }
}
