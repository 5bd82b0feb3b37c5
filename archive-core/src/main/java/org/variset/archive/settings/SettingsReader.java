package org.variset.archive.settings;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import org.variset.archive.problem.ArchiveException;

/** Reads a gym's settings with plain JDBC: what is in effect on a day, and every change ever made. */
public final class SettingsReader {
    private final Connection connection;

    /** Reads on a connection the caller keeps open. */
    public SettingsReader(Connection connection) {
        this.connection = connection;
    }

    /** The settings in effect on a day: for each key and scope, the latest value that took effect by then. */
    public GymSettings inEffectOn(long gymId, LocalDate day) {
        return GymSettings.of(read(gymId, day));
    }

    /** Every value the gym ever gave, in the order they took effect. */
    public List<SettingValue> history(long gymId) {
        return read(gymId, LocalDate.MAX);
    }

    private List<SettingValue> read(long gymId, LocalDate until) {
        // Same day: the later write wins (ids grow with each write).
        String sql = "SELECT setting_key, scope, effective_on, value_json FROM gym_setting WHERE gym_id = ?"
                + " AND effective_on <= ? ORDER BY effective_on, id";
        List<SettingValue> out = new ArrayList<>();
        try (PreparedStatement s = connection.prepareStatement(sql)) {
            s.setLong(1, gymId);
            s.setObject(2, until.equals(LocalDate.MAX) ? LocalDate.of(9999, 12, 31) : until);
            try (ResultSet rs = s.executeQuery()) {
                while (rs.next()) {
                    SettingKey key;
                    try {
                        key = SettingKey.of(rs.getString(1));
                    } catch (IllegalArgumentException unknown) {
                        continue; // a key of a newer Variset: this one does not use it
                    }
                    String json = rs.getString(4);
                    out.add(new SettingValue(
                            key,
                            rs.getString(2),
                            rs.getObject(3, LocalDate.class),
                            "null".equals(json) ? null : SettingKey.read(json)));
                }
            }
        } catch (SQLException e) {
            throw new ArchiveException(
                    ArchiveException.Problem.DAMAGED, "Cannot read the gym's settings: " + e.getMessage(), e);
        }
        return out;
    }
}
