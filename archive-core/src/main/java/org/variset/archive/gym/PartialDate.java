package org.variset.archive.gym;

import java.time.LocalDate;
import java.time.YearMonth;
import java.time.format.DateTimeParseException;

/**
 * A date as given on the command line: a day ({@code 2026-03-02}), a month ({@code 2026-03}) or a year
 * ({@code 2026}). A partial date covers all its days: {@code --from} takes the first, {@code --to} the last.
 *
 * @param first the first day covered
 * @param last the last day covered
 */
public record PartialDate(LocalDate first, LocalDate last) {

    /**
     * Reads a day, month or year.
     *
     * @throws IllegalArgumentException saying what a date looks like
     */
    public static PartialDate parse(String text) {
        String t = text == null ? "" : text.strip();
        try {
            if (t.matches("\\d{4}-\\d{2}-\\d{2}")) {
                LocalDate d = LocalDate.parse(t);
                return new PartialDate(d, d);
            }
            if (t.matches("\\d{4}-\\d{2}")) {
                YearMonth m = YearMonth.parse(t);
                return new PartialDate(m.atDay(1), m.atEndOfMonth());
            }
            if (t.matches("\\d{4}")) {
                int y = Integer.parseInt(t);
                return new PartialDate(LocalDate.of(y, 1, 1), LocalDate.of(y, 12, 31));
            }
        } catch (DateTimeParseException e) {
            throw new IllegalArgumentException(
                    "'" + text + "' is not a real date (expected YYYY-MM-DD, YYYY-MM or " + "YYYY)", e);
        }
        throw new IllegalArgumentException("'" + text + "' is not a date (expected YYYY-MM-DD, YYYY-MM or YYYY)");
    }
}
