package org.variset.imports;

import java.util.Objects;

/**
 * One thing wrong with the input, located as precisely as the format allows.
 *
 * @param file the file's name as the user gave it
 * @param line the physical line (CSV; the header is line 1), the sheet row (XLSX) or the line of the JSON object;
 *     0 when the problem concerns the whole file
 * @param column the column or field, or empty for a whole row or file
 * @param message what is wrong, with what was expected in parentheses
 */
public record Problem(String file, int line, String column, String message) {

    /** Checks the fields. */
    public Problem {
        Objects.requireNonNull(file, "file");
        Objects.requireNonNull(message, "message");
        column = column == null ? "" : column;
    }

    /** {@code file:line: column: message}, leaving out what is unknown. */
    @Override
    public String toString() {
        StringBuilder b = new StringBuilder(file);
        if (line > 0) {
            b.append(':').append(line);
        }
        b.append(": ");
        if (!column.isEmpty()) {
            b.append(column).append(": ");
        }
        return b.append(message).toString();
    }
}
