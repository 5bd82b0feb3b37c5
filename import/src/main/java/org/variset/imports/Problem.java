package org.variset.imports;

import java.util.Objects;
import org.variset.archive.problem.Remedy;

/**
 * One thing wrong with the input, located as precisely as the format allows.
 *
 * @param file the file's name as the user gave it
 * @param line the physical line (CSV; the header is line 1), the sheet row (XLSX) or the line of the JSON object;
 *     0 when the problem concerns the whole file
 * @param column the column or field, or empty for a whole row or file
 * @param message what is wrong, with what was expected in parentheses
 * @param remedy what can be done about it beyond fixing the cell, for the front end to word
 */
public record Problem(String file, int line, String column, String message, Remedy remedy) {

    /** Checks the fields. */
    public Problem {
        Objects.requireNonNull(file, "file");
        Objects.requireNonNull(message, "message");
        Objects.requireNonNull(remedy, "remedy");
        column = column == null ? "" : column;
    }

    /** A problem whose fix is in the file itself. */
    public Problem(String file, int line, String column, String message) {
        this(file, line, column, message, Remedy.NONE);
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
