package org.variset.cli.command;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.Set;
import org.variset.app.Document;
import org.variset.app.VarisetVersion;
import org.variset.archive.file.AtomicFile;
import org.variset.reports.pdf.PdfOptions;
import picocli.CommandLine.Option;

/** The {@code --pdf}, {@code --paper} and {@code --force} options of commands that print a document. */
public final class PdfFileOptions {
    @Option(names = "--pdf", paramLabel = "FILE", description = "Also write a PDF document to FILE.")
    Path pdf;

    @Option(
            names = "--paper",
            paramLabel = "SIZE",
            defaultValue = "a4",
            description = "Paper size of the PDF: a4 or letter (default: ${DEFAULT-VALUE}).")
    PdfOptions.Paper paper;

    @Option(names = "--force", description = "Replace the PDF file if it exists.")
    boolean force;

    /** Writes the document when --pdf was given, warning about characters no font could print. */
    void write(LocalDate today, PrintWriter err, Document doc) {
        if (pdf == null) {
            return;
        }
        PdfOptions options = new PdfOptions(paper, today, VarisetVersion.current());
        java.util.concurrent.atomic.AtomicReference<Set<String>> missing =
                new java.util.concurrent.atomic.AtomicReference<>(Set.of());
        AtomicFile.write(pdf, force, out -> missing.set(doc.write(options, out)));
        err.println("Wrote " + pdf + ".");
        if (!missing.get().isEmpty()) {
            err.println("variset: warning: no font on this computer has these characters, which print as blanks in "
                    + pdf + ": " + String.join(" ", missing.get()) + ". Install a font that has them (for Chinese, "
                    + "Japanese or Korean names, a Noto Sans CJK font) and write the PDF again.");
        }
    }

    /** True when a PDF was asked for. */
    boolean wanted() {
        return pdf != null;
    }
}
