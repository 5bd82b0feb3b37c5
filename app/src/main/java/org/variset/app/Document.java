package org.variset.app;

import java.io.OutputStream;
import java.util.Set;
import org.variset.reports.pdf.PdfOptions;

/** A PDF document a use case can write, for a front end to put in a file or send. */
@FunctionalInterface
public interface Document {
    /**
     * Writes the document.
     *
     * @return characters no font could print (empty when every name printed)
     */
    Set<String> write(PdfOptions options, OutputStream out);
}
