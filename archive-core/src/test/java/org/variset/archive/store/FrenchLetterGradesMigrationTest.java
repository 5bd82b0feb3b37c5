package org.variset.archive.store;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.sql.Connection;
import java.sql.ResultSet;
import java.sql.Statement;
import java.util.LinkedHashMap;
import java.util.Map;
import org.flywaydb.core.Flyway;
import org.h2.jdbcx.JdbcDataSource;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Schema version 5 reads French grades again: an archive written at version 4 with the older letter grades gets
 * their new values (docs/spec/grades.md: 5a 9, 5b 9.5, 5c 10), and each moved route is logged for the search index.
 */
class FrenchLetterGradesMigrationTest {

    @Test
    void movesFiveBHalfALevelAboveFiveAAndLogsTheRoute(@TempDir Path tmp) throws Exception {
        Path dir = tmp.resolve("archive");
        JdbcDataSource ds = new JdbcDataSource();
        ds.setURL("jdbc:h2:file:" + dir.resolve("archive").toAbsolutePath() + ";DB_CLOSE_ON_EXIT=FALSE");
        Flyway.configure(getClass().getClassLoader())
                .dataSource(ds)
                .locations("classpath:db/migration")
                .target("4")
                .load()
                .migrate();
        try (Connection c = ds.getConnection();
                Statement s = c.createStatement()) {
            s.executeUpdate("INSERT INTO gym (id, name, time_zone) VALUES (1, 'Quarry Loft', 'UTC')");
            s.executeUpdate("INSERT INTO wall (id, gym_id, name) VALUES (1, 1, 'Lead')");
            s.executeUpdate("INSERT INTO reset (id, gym_id, wall_id, label, reset_on) VALUES (1, 1, 1, 'L', DATE "
                    + "'2026-03-02')");
            // The values version 4 stored: 5a and 5b both as French 5 (9), 5c as 5+ (10), 6a as 11.
            String[][] routes = {
                {"1", "5a", "9"}, {"2", "5b", "9"}, {"3", "5B+", "9"}, {"4", "5c", "10"}, {"5", "6a", "11"}
            };
            for (String[] r : routes) {
                s.executeUpdate("INSERT INTO route (id, gym_id, wall_id, reset_id, label, set_on, discipline, "
                        + "grade_text, grade_scale, grade_ircra) VALUES (" + r[0] + ", 1, 1, 1, 'R" + r[0] + "', DATE "
                        + "'2026-03-02', 'ROPE', '" + r[1] + "', 'FRENCH', " + r[2] + ")");
            }
        }
        try (Archive a = Archive.open(dir);
                Statement s = a.connection().createStatement()) {
            Map<String, Double> ircra = new LinkedHashMap<>();
            try (ResultSet rs = s.executeQuery("SELECT grade_text, grade_ircra FROM route ORDER BY id")) {
                while (rs.next()) {
                    ircra.put(rs.getString(1), rs.getDouble(2));
                }
            }
            assertThat(ircra)
                    .containsExactly(
                            Map.entry("5a", 9.0),
                            Map.entry("5b", 9.5),
                            Map.entry("5B+", 9.5),
                            Map.entry("5c", 10.0),
                            Map.entry("6a", 11.0));
            try (ResultSet rs = s.executeQuery("SELECT route_id FROM route_change ORDER BY route_id")) {
                assertThat(rs.next()).isTrue();
                assertThat(rs.getLong(1)).isEqualTo(2);
                assertThat(rs.next()).isTrue();
                assertThat(rs.getLong(1)).isEqualTo(3);
                assertThat(rs.next()).isFalse();
            }
        }
    }
}
