package org.variset.bench.floor;

import java.sql.PreparedStatement;
import java.sql.SQLException;
import java.sql.Types;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/** How the floor turns CSV cells into column values: as plainly as the interchange spec allows. */
final class FloorCells {
    private FloorCells() {}

    static String squash(String s) {
        StringBuilder b = new StringBuilder(s.length());
        s.toLowerCase(Locale.ROOT)
                .codePoints()
                .filter(Character::isLetterOrDigit)
                .forEach(b::appendCodePoint);
        return b.toString();
    }

    static List<String> list(String cell) {
        List<String> out = new ArrayList<>();
        for (String s : cell.split(";")) {
            if (!s.isBlank()) {
                out.add(s.strip());
            }
        }
        return out;
    }

    static String json(List<String> xs) {
        if (xs.isEmpty()) {
            return null;
        }
        StringBuilder b = new StringBuilder("[");
        for (String x : xs) {
            b.append(b.length() > 1 ? "," : "")
                    .append('"')
                    .append(x.replace("\\", "\\\\").replace("\"", "\\\""))
                    .append('"');
        }
        return b.append(']').toString();
    }

    static String emptyToNull(String s) {
        return s == null || s.isEmpty() ? null : s;
    }

    static void setDouble(PreparedStatement s, int i, String cell) throws SQLException {
        if (cell == null || cell.isEmpty()) {
            s.setNull(i, Types.DOUBLE);
        } else {
            s.setDouble(i, Double.parseDouble(cell));
        }
    }
}
