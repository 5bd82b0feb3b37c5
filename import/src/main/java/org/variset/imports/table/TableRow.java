package org.variset.imports.table;

import java.util.List;
import java.util.Map;

/**
 * One row of a table as read: where it came from and its cells by column name (lower case for the spec's
 * columns, as written for extra ones). A cell is text, or a list of values where the format has lists (JSON).
 *
 * @param file the file's display name
 * @param line the physical line (CSV), sheet row (XLSX) or line of the object (JSON)
 * @param cells the cells; an absent or empty cell means no value
 * @param decimalComma true when numbers may use a decimal comma (a semicolon-delimited CSV)
 */
public record TableRow(String file, int line, Map<String, Object> cells, boolean decimalComma) {

    /** The text of a cell, stripped; null when absent or blank. A list cell gives null. */
    public String text(String column) {
        Object v = cells.get(column);
        if (v == null || v instanceof List) {
            return null;
        }
        String s = v.toString().strip();
        return s.isEmpty() ? null : s;
    }

    /** The raw value of a cell: a String, a List, or null. */
    public Object raw(String column) {
        return cells.get(column);
    }
}
