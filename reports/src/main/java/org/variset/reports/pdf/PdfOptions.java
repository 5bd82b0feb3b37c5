package org.variset.reports.pdf;

import com.lowagie.text.PageSize;
import com.lowagie.text.Rectangle;
import java.time.LocalDate;
import java.util.Locale;

/**
 * How documents are made.
 *
 * @param paper the paper size
 * @param generatedOn the day printed as the generation date
 * @param version the Variset version printed in the footer
 */
public record PdfOptions(Paper paper, LocalDate generatedOn, String version) {

    /** Paper sizes. */
    public enum Paper {
        /** ISO A4, 210 x 297 mm. */
        A4(PageSize.A4),
        /** US Letter, 8.5 x 11 in. */
        LETTER(PageSize.LETTER);

        private final Rectangle size;

        Paper(Rectangle size) {
            this.size = size;
        }

        /** The page rectangle. */
        Rectangle size() {
            return size;
        }

        /** The word on the command line. */
        public String word() {
            return name().toLowerCase(Locale.ROOT);
        }
    }
}
