package org.variset.imports.export;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * One table to write: the spec's columns, then the extra columns met, and rows of cells. A cell is text (to be
 * neutralised in spreadsheets), a number, or a list of numbers or texts.
 */
final class ExportTable {
    /** A cell value that is a number, written as a number. */
    record Num(double value) {
        @Override
        public String toString() {
            return BigDecimal.valueOf(value).stripTrailingZeros().toPlainString();
        }
    }

    private final String name;
    private final List<String> columns;
    private final Set<String> extras = new LinkedHashSet<>();
    private final List<Map<String, Object>> rows = new ArrayList<>();

    ExportTable(String name, List<String> columns) {
        this.name = name;
        this.columns = columns;
    }

    String name() {
        return name;
    }

    /** Adds a row; its extra fields become columns after the spec's. */
    void add(Map<String, Object> cells, Map<String, String> extraFields) {
        Map<String, Object> row = new LinkedHashMap<>(cells);
        extraFields.forEach((k, v) -> {
            extras.add(k);
            row.put("extra:" + k, v);
        });
        rows.add(row);
    }

    /** Every column, the spec's first. */
    List<String> header() {
        List<String> h = new ArrayList<>(columns);
        h.addAll(extras);
        return h;
    }

    List<Map<String, Object>> rows() {
        return rows;
    }

    /** The cell of a row under a header column. */
    Object cell(Map<String, Object> row, String column) {
        return columns.contains(column) ? row.get(column) : row.get("extra:" + column);
    }

    /** A cell as spreadsheet text: lists joined with {@code ;}, text neutralised. */
    static String text(Object v, boolean neutralise) {
        if (v == null) {
            return "";
        }
        if (v instanceof List<?> l) {
            List<String> parts = new ArrayList<>();
            l.forEach(x -> parts.add(x instanceof Double d ? new Num(d).toString() : x.toString()));
            String joined = String.join(";", parts);
            return neutralise ? CellSafety.neutralise(joined) : joined;
        }
        if (v instanceof Num n) {
            return n.toString();
        }
        return neutralise ? CellSafety.neutralise(v.toString()) : v.toString();
    }
}
