package org.variset.cli;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.cos.COSName;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.PDResources;
import org.apache.pdfbox.pdmodel.font.PDFont;
import org.apache.pdfbox.pdmodel.graphics.PDXObject;
import org.apache.pdfbox.pdmodel.graphics.form.PDFormXObject;

/** The fonts a PDF uses, read back with PDFBox: on every page and in every form it draws, with "embedded" or not. */
final class PdfFontList {
    private PdfFontList() {}

    /** "DejaVuSans (embedded)", "Helvetica (not embedded)", one entry per font resource. */
    static List<String> of(Path pdf) throws IOException {
        try (PDDocument d = Loader.loadPDF(pdf.toFile())) {
            List<String> fonts = new ArrayList<>();
            for (PDPage p : d.getPages()) {
                collect(p.getResources(), fonts, 0);
            }
            return fonts;
        }
    }

    private static void collect(PDResources res, List<String> out, int depth) throws IOException {
        if (res == null || depth > 20) {
            return;
        }
        for (COSName n : res.getFontNames()) {
            PDFont f = res.getFont(n);
            out.add(f.getName() + (f.isEmbedded() ? " (embedded)" : " (not embedded)"));
        }
        for (COSName n : res.getXObjectNames()) {
            PDXObject x = res.getXObject(n);
            if (x instanceof PDFormXObject form) {
                collect(form.getResources(), out, depth + 1);
            }
        }
    }
}
