package org.variset.reports.pdf;

import java.io.OutputStream;
import java.util.List;
import java.util.Set;
import org.variset.archive.read.RouteRecord;
import org.variset.reports.figures.RouteLineFigures;
import org.variset.reports.route.RouteText;

/**
 * Search hits as a printable study sheet for trainees: each route with its grade, moves, holds by type and the
 * directions they face, and a sketch of its line where hold positions are known.
 */
public final class StudySheetPdf {
    private StudySheetPdf() {}

    /**
     * Writes the sheet.
     *
     * @param query what was searched, as typed
     * @param total how many routes matched (the sheet lists the routes given)
     * @return characters no font could print
     */
    public static Set<String> write(
            String query, long total, List<RouteRecord> routes, PdfOptions options, OutputStream out) {
        try (PdfDoc doc = new PdfDoc(out, options, "Study sheet", "search: " + query)) {
            doc.paragraph(
                    total
                            + (total == 1 ? " route matches" : " routes match")
                            + (routes.size() < total ? "; the first " + routes.size() + " are listed." : "."),
                    PdfDoc.BODY,
                    false,
                    Palette.MUTED);
            int n = 0;
            for (RouteRecord r : routes) {
                doc.paragraph((++n) + ". " + RouteText.heading(r), 10, true, Palette.INK);
                String moves = RouteText.moves(r);
                if (!moves.isEmpty()) {
                    doc.paragraph(moves);
                }
                doc.paragraph(RouteText.holds(r));
                RouteLineFigures line = RouteLineFigures.of(r, 1.0, 1.6);
                if (line.points().size() >= 2) {
                    doc.drawing(
                            150,
                            150,
                            (g, size) -> Drawings.line(g, size[0], size[1], line.points(), List.of(), doc.fonts()));
                } else if (!r.holds().isEmpty()) {
                    doc.paragraph("(no sketch: not every hand hold has a position)", 7.5f, false, Palette.MUTED);
                }
                if (r.notes() != null) {
                    doc.paragraph("notes: " + r.notes(), 8, false, Palette.MUTED);
                }
                doc.space(4);
            }
            return Set.copyOf(doc.missingCharacters());
        }
    }
}
