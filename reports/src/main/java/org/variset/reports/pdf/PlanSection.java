package org.variset.reports.pdf;

import java.util.ArrayList;
import java.util.List;
import java.util.stream.Collectors;
import org.variset.reports.catalogue.Figures;
import org.variset.reports.format.FigureFormat;
import org.variset.reports.plan.ResetPlan;
import org.variset.reports.plan.VarietyGaps;

/** The plan for a wall's next reset, as a section of the audit. */
final class PlanSection {
    private PlanSection() {}

    static void write(PdfDoc doc, ResetPlan p) {
        doc.heading(
                "Next reset of " + p.wall() + ", due " + p.on() + ": " + p.routes() + " "
                        + p.discipline().word() + " routes",
                true);
        if (p.grades() == null) {
            doc.paragraph("Grade slots: none proposed: " + p.undefined().get("slots") + ".");
        } else {
            ResetPlan.GradeSlots gs = p.grades();
            long restTotal = java.util.Arrays.stream(gs.rest()).sum();
            List<List<String>> rows = new ArrayList<>();
            for (int i = 0; i < gs.bands().size(); i++) {
                rows.add(List.of(
                        gs.bands().get(i),
                        String.valueOf(gs.rest()[i]),
                        FigureFormat.round(gs.targetShares()[i] * (restTotal + p.routes()), 1),
                        String.valueOf(gs.slots()[i])));
            }
            doc.table(List.of("band", "up elsewhere", "routes the target wants", "proposed"), rows, new float[] {
                1.2f, 1.4f, 1.6f, 1.2f
            });
            doc.paragraph("With these slots in place of " + p.wall() + "'s current routes, the gym's "
                    + p.discipline().word() + " routes move from " + Figures.GRADES_DISTANCE.text(gs.distanceNow())
                    + " to "
                    + Figures.GRADES_DISTANCE.text(gs.distanceAfter()) + " bands from the target (the least any "
                    + p.routes() + " slots can give; ties go to the wall's previous mix)"
                    + (gs.targetIsDefault() ? "; the target is the example pyramid" : "") + ".");
        }
        doc.paragraph(
                "Bring back (the share now, on "
                        + String.join(", ", p.baseline().walls()) + ", at least "
                        + FigureFormat.percent(p.margin()) + " below the median of their "
                        + p.baseline().resets()
                        + (p.baseline().resets() == 1 ? " reset" : " resets") + " of the last twelve months): "
                        + (p.gaps().isEmpty() ? "nothing." : ""),
                PdfDoc.BODY,
                true,
                Palette.INK);
        doc.bullets(p.gaps().stream().limit(12).map(PlanSection::gap).toList());
        doc.paragraph("Hold shapes to rest (the hand-hold shapes " + p.wall() + " used most in its last three "
                + "resets: " + p.shapesToRest().size() + " of " + p.shapesOnWall() + ", by resets then placements; "
                + "foot holds left out): "
                + (p.shapesToRest().isEmpty()
                        ? "none recorded."
                        : p.shapesToRest().entrySet().stream()
                                        .map(e -> e.getKey() + " (" + e.getValue() + ")")
                                        .collect(Collectors.joining(", "))
                                + "."));
    }

    private static String gap(VarietyGaps.Gap g) {
        String what = switch (g.field()) {
            case "grip" -> "grips facing " + g.category();
            case "holds" -> g.category() + " holds";
            case "moves" -> g.category() + " (move)";
            default -> g.category() + " (style)";
        };
        return what + ": " + FigureFormat.percent(g.standingShare()) + " now, "
                + FigureFormat.percent(g.baselineShare()) + " in the median reset";
    }
}
