package org.variset.imports.export;

/**
 * Neutralises text that a spreadsheet would execute: a cell starting with {@code =}, {@code +}, {@code -},
 * {@code @}, tab or carriage return gets a leading single quote (OWASP Foundation, "CSV Injection",
 * owasp.org/www-community/attacks/CSV_Injection). Numbers are written as numbers and left alone, so an angle of
 * -15 stays a number.
 */
public final class CellSafety {
    private CellSafety() {}

    /** The text, with a leading quote when a spreadsheet would read it as a formula. */
    public static String neutralise(String text) {
        if (text == null || text.isEmpty()) {
            return text;
        }
        return "=+-@\t\r".indexOf(text.charAt(0)) >= 0 ? "'" + text : text;
    }
}
