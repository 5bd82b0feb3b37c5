package db.migration;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import org.flywaydb.core.api.migration.BaseJavaMigration;
import org.flywaydb.core.api.migration.Context;
import org.variset.archive.grade.Discipline;
import org.variset.archive.grade.GradeException;
import org.variset.archive.grade.GradeReader;
import org.variset.archive.grade.GradeScale;

/**
 * Schema version 5: the older French letter grades (4a to 5c) read as the letters they are, 4b and 5b half a level
 * above 4a and 5a instead of on them (docs/spec/grades.md). The IRCRA value of every French grade is read again from
 * its text, and each route whose value moves is logged as changed, so that search indexes catch up. A Java step
 * because the value is the grade reader's, whatever form the setters wrote (5b, 5B+, 5a/5b).
 */
public class V5__french_letter_grades extends BaseJavaMigration {
    @Override
    public void migrate(Context context) throws SQLException {
        Connection c = context.getConnection();
        GradeReader reader = GradeReader.standard();
        List<long[]> moved = new ArrayList<>();
        List<Double> values = new ArrayList<>();
        try (PreparedStatement s = c.prepareStatement(
                        "SELECT id, gym_id, grade_text, grade_ircra FROM route WHERE grade_scale = 'FRENCH'");
                ResultSet rs = s.executeQuery()) {
            while (rs.next()) {
                double now;
                try {
                    now = reader.read(rs.getString(3), Discipline.ROPE, GradeScale.FRENCH, Set.of())
                            .ircra();
                } catch (GradeException e) {
                    continue; // stored by an earlier reading this one refuses: leave its value as it was
                }
                if (Math.abs(now - rs.getDouble(4)) > 1e-9) {
                    moved.add(new long[] {rs.getLong(1), rs.getLong(2)});
                    values.add(now);
                }
            }
        }
        boolean postgres =
                c.getMetaData().getDatabaseProductName().toLowerCase().contains("postgres");
        String tx = postgres ? "pg_current_xact_id()::text::bigint" : "NULL";
        try (PreparedStatement update = c.prepareStatement("UPDATE route SET grade_ircra = ? WHERE id = ?");
                PreparedStatement log = c.prepareStatement(
                        "INSERT INTO route_change (route_id, gym_id, tx) VALUES (?, ?, " + tx + ")")) {
            for (int i = 0; i < moved.size(); i++) {
                update.setDouble(1, values.get(i));
                update.setLong(2, moved.get(i)[0]);
                update.addBatch();
                log.setLong(1, moved.get(i)[0]);
                log.setLong(2, moved.get(i)[1]);
                log.addBatch();
            }
            update.executeBatch();
            log.executeBatch();
        }
    }
}
