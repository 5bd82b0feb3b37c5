package org.variset.imports.row;

import java.text.Normalizer;
import java.time.LocalDate;
import java.time.format.DateTimeFormatter;
import java.time.format.DateTimeParseException;
import java.time.format.ResolverStyle;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Pattern;
import org.variset.imports.ProblemList;
import org.variset.imports.table.ExampleRow;
import org.variset.imports.table.TableKind;
import org.variset.imports.table.TableRow;

/**
 * Reads the cells of one row, recording a located problem for each bad one; {@link #ok()} says whether the row
 * is usable. Text that export neutralised against spreadsheet formulas (a leading {@code '} before {@code =},
 * {@code +}, {@code -}, {@code @}, tab or carriage return) is restored.
 */
final class CellReader {
    private static final Pattern ISO_DATE = Pattern.compile("\\d{4}-\\d{2}-\\d{2}");
    private static final Pattern OTHER_DATE = Pattern.compile("\\d{1,4}[/.\\-]\\d{1,2}[/.\\-]\\d{1,4}");
    private static final DateTimeFormatter STRICT =
            DateTimeFormatter.ofPattern("uuuu-MM-dd").withResolverStyle(ResolverStyle.STRICT);

    private final TableRow row;
    private final ProblemList problems;
    private boolean ok = true;

    CellReader(TableRow row, ProblemList problems) {
        this.row = row;
        this.problems = problems;
    }

    boolean ok() {
        return ok;
    }

    TableRow row() {
        return row;
    }

    /** Records a problem in a column and marks the row unusable. */
    void problem(String column, String message) {
        Object path = row.cells().get("@path");
        problems.add(row.file(), row.line(), path == null ? column : path + "." + column, message);
        ok = false;
    }

    /** The gym cell of a row; null, with a problem, when it is missing or is the template's example row. */
    String gym() {
        String gym = name("gym", true);
        if (ExampleRow.is(gym)) {
            problem(
                    "gym",
                    "this is the template's example row: delete it (your own rows go below the header, or in its "
                            + "place)");
            return null;
        }
        return gym;
    }

    /** The longest name or short text the archive keeps (its VARCHAR(255) columns). */
    static final int MAX_NAME = 255;
    /** The longest notes the archive keeps. */
    static final int MAX_NOTES = 100_000;
    /** The longest list (moves, styles, setters, difficulties) as the archive stores it, with room for JSON quoting. */
    static final int MAX_LIST = 9_000;
    /** The longest set of extra columns of one row, as the archive stores it. */
    static final int MAX_EXTRAS = 90_000;

    /**
     * A text cell, restored from formula neutralisation; null when empty, or (with a problem) when it is longer than
     * the archive keeps.
     */
    String text(String column) {
        String t = row.text(column);
        if (t == null) {
            return null;
        }
        int max = column.equals("notes") ? MAX_NOTES : MAX_NAME;
        if (t.length() > max) {
            problem(column, tooLong(t.length(), max));
            return null;
        }
        return restore(t);
    }

    private static String tooLong(int length, int max) {
        return String.format(
                java.util.Locale.ROOT,
                "%,d characters, more than the %,d the archive keeps here " + "(expected a shorter text)",
                length,
                max);
    }

    /** Restores text that export prefixed with a quote so that a spreadsheet would not run it (OWASP). */
    static String restore(String t) {
        if (t.length() >= 2 && t.charAt(0) == '\'' && "=+-@\t\r".indexOf(t.charAt(1)) >= 0) {
            return t.substring(1);
        }
        return t;
    }

    /** A name: trimmed, NFC-normalised text; a problem when missing and required. */
    String name(String column, boolean required) {
        boolean present = row.text(column) != null;
        String t = text(column);
        if (t == null) {
            if (required && !present) {
                problem(column, "missing value (this column is required)");
            }
            return null;
        }
        return Normalizer.normalize(t, Normalizer.Form.NFC);
    }

    /** An ISO date; a problem for ambiguous, impossible or unreadable dates. */
    LocalDate date(String column, boolean required) {
        String t = text(column);
        if (t == null) {
            if (required) {
                problem(column, "missing date (expected YYYY-MM-DD)");
            }
            return null;
        }
        if (ISO_DATE.matcher(t).matches()) {
            try {
                return LocalDate.parse(t, STRICT);
            } catch (DateTimeParseException e) {
                problem(column, "no such date '" + t + "' (expected a real calendar date, YYYY-MM-DD)");
                return null;
            }
        }
        if (OTHER_DATE.matcher(t).matches()) {
            problem(column, "date '" + t + "' is ambiguous (write dates as ISO YYYY-MM-DD, for example 2026-03-02)");
        } else {
            problem(column, "'" + t + "' is not a date (expected YYYY-MM-DD)");
        }
        return null;
    }

    /** A number within bounds, with a decimal comma where the file allows one; null when empty. */
    Double number(String column, double min, double max, String expected) {
        String t = text(column);
        if (t == null) {
            return null;
        }
        String n = row.decimalComma() ? t.replace(',', '.') : t;
        double v;
        try {
            v = Double.parseDouble(n);
        } catch (NumberFormatException e) {
            problem(column, "'" + t + "' is not a number (expected " + expected + ")");
            return null;
        }
        if (!Double.isFinite(v) || v < min || v > max) {
            problem(column, t + " is out of range (expected " + expected + ")");
            return null;
        }
        return v;
    }

    /** A whole number within bounds; null when empty. */
    Integer integer(String column, int min, int max, String expected) {
        String t = text(column);
        if (t == null) {
            return null;
        }
        try {
            int v = Integer.parseInt(t.endsWith(".0") ? t.substring(0, t.length() - 2) : t);
            if (v < min || v > max) {
                problem(column, t + " is out of range (expected " + expected + ")");
                return null;
            }
            return v;
        } catch (NumberFormatException e) {
            problem(column, "'" + t + "' is not a whole number (expected " + expected + ")");
            return null;
        }
    }

    /** A list: a JSON array, or text split on {@code ;}; empty entries dropped. */
    List<String> list(String column) {
        Object raw = row.raw(column);
        List<String> out = new ArrayList<>();
        if (raw instanceof List<?> l) {
            l.forEach(x -> {
                if (x != null && !x.toString().isBlank()) {
                    out.add(restore(x.toString().strip()));
                }
            });
        } else if (raw != null) {
            for (String part : raw.toString().split(";")) {
                if (!part.isBlank()) {
                    out.add(restore(part.strip()));
                }
            }
        }
        int length = out.stream().mapToInt(x -> x.length() + 3).sum();
        if (length > MAX_LIST) {
            problem(column, tooLong(length, MAX_LIST));
            return List.of();
        }
        return out;
    }

    /** The cells of columns the spec does not define, in file order; cells beyond the header are problems. */
    Map<String, String> extras(TableKind kind) {
        Map<String, String> out = new LinkedHashMap<>();
        row.cells().forEach((k, v) -> {
            if (k.startsWith("#")) {
                problem("cell " + k.substring(1), "this row has more cells than the header has columns");
            } else if (!k.startsWith("@") && !kind.knows(k) && !(kind == TableKind.ROUTES && k.equals("holds"))) {
                String near = kind.nearest(k);
                if (near != null) {
                    problem(k, "unknown column (did you mean `" + near + "`?)");
                    return;
                }
                String t = v == null ? null : v.toString();
                if (t != null && !t.isEmpty()) {
                    out.put(k, restore(t));
                }
            }
        });
        int length = out.entrySet().stream()
                .mapToInt(e -> e.getKey().length() + e.getValue().length() + 6)
                .sum();
        if (length > MAX_EXTRAS) {
            problem("extra columns", tooLong(length, MAX_EXTRAS));
            return Map.of();
        }
        return out;
    }
}
