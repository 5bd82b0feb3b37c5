package org.variset.reports.pdf;

import com.lowagie.text.Document;
import com.lowagie.text.DocumentException;
import com.lowagie.text.Element;
import com.lowagie.text.Image;
import com.lowagie.text.Paragraph;
import com.lowagie.text.Phrase;
import com.lowagie.text.Rectangle;
import com.lowagie.text.pdf.ColumnText;
import com.lowagie.text.pdf.PdfContentByte;
import com.lowagie.text.pdf.PdfPCell;
import com.lowagie.text.pdf.PdfPTable;
import com.lowagie.text.pdf.PdfPageEventHelper;
import com.lowagie.text.pdf.PdfTemplate;
import com.lowagie.text.pdf.PdfWriter;
import java.awt.Color;
import java.awt.Graphics2D;
import java.io.OutputStream;
import java.util.List;
import java.util.Set;
import java.util.function.BiConsumer;
import org.jfree.chart.JFreeChart;
import org.variset.reports.Safety;

/**
 * One PDF document being written: title block, running header and numbered footer ("page 2 of 5"), headings,
 * paragraphs, tables, charts and boxes, all in the embedded fonts.
 */
final class PdfDoc implements AutoCloseable {
    static final float BODY = 9f;
    private static final float MARGIN = 42f;
    /** Points of room a heading needs below it (a chart's height), else it starts the next page. */
    private static final float KEEP_WITH_HEADING = 190f;

    private final Document document;
    private final PdfWriter writer;
    private final PdfFonts fonts = new PdfFonts();

    PdfDoc(OutputStream out, PdfOptions options, String title, String subject) {
        document = new Document(options.paper().size(), MARGIN, MARGIN, MARGIN + 14, MARGIN + 10);
        try {
            writer = PdfWriter.getInstance(document, out);
        } catch (DocumentException e) {
            throw new IllegalStateException("cannot start the PDF", e);
        }
        writer.setStrictImageSequence(true);
        writer.setPageEvent(new Frame(
                title + " · " + subject, "Generated " + options.generatedOn() + " by Variset " + options.version()));
        document.addTitle(title + " · " + subject);
        document.addCreator("Variset " + options.version());
        document.open();
        add(new Paragraph(fonts.phrase(title, 18, true, Palette.INK)));
        Paragraph sub = new Paragraph(fonts.phrase(subject, 11, false, Palette.MUTED));
        sub.setSpacingAfter(8);
        add(sub);
    }

    /** A section heading, on a new page when asked or when too little room is left for anything under it. */
    void heading(String text, boolean newPage) {
        if (newPage || writer.getVerticalPosition(true) - document.bottom() < KEEP_WITH_HEADING) {
            document.newPage();
        }
        Paragraph p = new Paragraph(fonts.phrase(text, 13, true, Palette.BLUE));
        p.setSpacingBefore(10);
        p.setSpacingAfter(4);
        add(p);
    }

    /**
     * A bold caption kept with what follows it: on the next page when less than {@code below} points (the height of
     * the chart or table under it) and a line are left.
     */
    void caption(String text, float below) {
        if (writer.getVerticalPosition(true) - document.bottom() < below + 2 * BODY * 1.3f + 6) {
            document.newPage();
        }
        paragraph(text, BODY, true, Palette.INK);
    }

    /** Body text. */
    void paragraph(String text) {
        paragraph(text, BODY, false, Palette.INK);
    }

    /** Text at a size, weight and colour. */
    void paragraph(String text, float size, boolean bold, Color color) {
        Paragraph p = new Paragraph(fonts.phrase(text, size, bold, color));
        p.setSpacingAfter(3);
        p.setLeading(size * 1.3f);
        add(p);
    }

    /** A bulleted list. */
    void bullets(List<String> items) {
        for (String i : items) {
            Paragraph p = new Paragraph();
            p.setFont(fonts.font(BODY, false, Palette.INK));
            p.add(fonts.phrase("•  ", BODY, true, Palette.BLUE));
            p.add(fonts.phrase(i, BODY, false, Palette.INK));
            p.setIndentationLeft(10);
            p.setFirstLineIndent(-10);
            p.setSpacingAfter(2);
            p.setLeading(BODY * 1.3f);
            add(p);
        }
    }

    /** A table with a shaded header row; numbers right-aligned from the second column on. */
    void table(List<String> header, List<List<String>> rows, float[] widths) {
        PdfPTable t = new PdfPTable(widths);
        t.setWidthPercentage(100);
        t.setHeaderRows(1);
        t.setSpacingBefore(3);
        t.setSpacingAfter(6);
        boolean[] numeric = new boolean[header.size()];
        for (int i = 1; i < header.size(); i++) {
            int col = i;
            numeric[i] = !rows.isEmpty() && rows.stream().allMatch(r -> looksNumeric(r.get(col)));
        }
        for (int i = 0; i < header.size(); i++) {
            PdfPCell c = cell(header.get(i), true, numeric[i]);
            c.setBackgroundColor(Palette.SHADE);
            t.addCell(c);
        }
        for (List<String> row : rows) {
            for (int i = 0; i < row.size(); i++) {
                t.addCell(cell(row.get(i), false, numeric[i]));
            }
        }
        add(t);
    }

    private PdfPCell cell(String text, boolean bold, boolean right) {
        PdfPCell c = new PdfPCell(fonts.phrase(text, BODY - 0.5f, bold, Palette.INK));
        c.setBorderColor(new Color(0xCC, 0xCC, 0xCC));
        c.setBorderWidth(0.5f);
        c.setPadding(3);
        c.setHorizontalAlignment(right ? Element.ALIGN_RIGHT : Element.ALIGN_LEFT);
        return c;
    }

    private static boolean looksNumeric(String s) {
        return s.matches("[-+]?[0-9][0-9.,]*%?( pts)?|–|< 0\\.001|");
    }

    /** A box with a bold title and text, shaded, for notes and cautions. */
    void box(String title, String text) {
        PdfPTable t = new PdfPTable(1);
        t.setWidthPercentage(100);
        t.setSpacingBefore(6);
        t.setSpacingAfter(6);
        Paragraph p = new Paragraph();
        p.setFont(fonts.font(BODY, false, Palette.INK));
        p.add(fonts.phrase(title + "  ", BODY, true, Palette.INK));
        p.add(fonts.phrase(text, BODY, false, Palette.INK));
        PdfPCell c = new PdfPCell(p);
        c.setBackgroundColor(Palette.SHADE);
        c.setBorderColor(Palette.INK);
        c.setBorderWidth(0.8f);
        c.setPadding(6);
        t.addCell(c);
        add(t);
    }

    /** The caution every audit carries. */
    void safety() {
        box("Safety.", Safety.CAUTION);
    }

    /** A JFreeChart chart as vector graphics, in the document's fonts. */
    void chart(JFreeChart chart, float width, float height) {
        drawing(
                width,
                height,
                (g, size) -> chart.draw(g, new java.awt.geom.Rectangle2D.Double(0, 0, size[0], size[1])));
    }

    /** A drawing of the given size (points), made on a Graphics2D that writes PDF vector graphics. */
    void drawing(float width, float height, BiConsumer<Graphics2D, float[]> draw) {
        PdfContentByte cb = writer.getDirectContent();
        PdfTemplate tp = cb.createTemplate(width, height);
        Graphics2D g = tp.createGraphics(width, height, fonts.mapper());
        try {
            draw.accept(g, new float[] {width, height});
        } finally {
            g.dispose();
        }
        try {
            Image img = Image.getInstance(tp);
            img.setAlignment(Element.ALIGN_CENTER);
            add(img);
        } catch (DocumentException e) {
            throw new IllegalStateException("cannot add a drawing", e);
        }
    }

    /** The usable page width in points. */
    float width() {
        return document.getPageSize().getWidth() - 2 * MARGIN;
    }

    /** The fonts, for charts. */
    PdfFonts fonts() {
        return fonts;
    }

    /** Characters no font could print. */
    Set<String> missingCharacters() {
        return fonts.missing();
    }

    private void add(Element e) {
        try {
            document.add(e);
        } catch (DocumentException ex) {
            throw new IllegalStateException("cannot add to the PDF", ex);
        }
    }

    @Override
    public void close() {
        document.close();
    }

    /** The running header and the footer with "page N of M" (M filled in when the document closes). */
    private final class Frame extends PdfPageEventHelper {
        private final String header;
        private final String footer;
        private PdfTemplate total;

        Frame(String header, String footer) {
            this.header = header;
            this.footer = footer;
        }

        @Override
        public void onOpenDocument(PdfWriter w, Document d) {
            total = w.getDirectContent().createTemplate(30, 12);
        }

        @Override
        public void onEndPage(PdfWriter w, Document d) {
            PdfContentByte cb = w.getDirectContent();
            Rectangle page = d.getPageSize();
            float left = d.left();
            float right = d.right();
            if (w.getPageNumber() > 1) {
                ColumnText.showTextAligned(
                        cb,
                        Element.ALIGN_LEFT,
                        fonts.phrase(header, 7.5f, false, Palette.MUTED),
                        left,
                        page.getTop() - 28,
                        0);
            }
            cb.setColorStroke(Palette.SHADE);
            cb.setLineWidth(0.5f);
            cb.moveTo(left, d.bottom() - 12);
            cb.lineTo(right, d.bottom() - 12);
            cb.stroke();
            ColumnText.showTextAligned(
                    cb, Element.ALIGN_LEFT, fonts.phrase(footer, 7.5f, false, Palette.MUTED), left, d.bottom() - 24, 0);
            Phrase p = fonts.phrase("page " + w.getPageNumber() + " of", 7.5f, false, Palette.MUTED);
            float textWidth = ColumnText.getWidth(p);
            // The total is a template filled in at the end; leave a word space before it.
            ColumnText.showTextAligned(cb, Element.ALIGN_LEFT, p, right - textWidth - 17, d.bottom() - 24, 0);
            cb.addTemplate(total, right - 14, d.bottom() - 24);
        }

        @Override
        public void onCloseDocument(PdfWriter w, Document d) {
            ColumnText.showTextAligned(
                    total,
                    Element.ALIGN_LEFT,
                    fonts.phrase(String.valueOf(w.getPageNumber() - 1), 7.5f, false, Palette.MUTED),
                    0,
                    0,
                    0);
        }
    }

    /** An empty line of space. */
    void space(float points) {
        Paragraph p = new Paragraph(fonts.phrase(" ", BODY, false, Palette.INK));
        p.setLeading(points);
        add(p);
    }
}
