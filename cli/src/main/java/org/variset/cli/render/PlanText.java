package org.variset.cli.render;

import java.util.ArrayList;
import java.util.List;
import java.util.stream.Collectors;
import org.variset.reports.catalogue.Figures;
import org.variset.reports.format.FigureFormat;
import org.variset.reports.plan.ResetPlan;
import org.variset.reports.plan.VarietyGaps;

/** A reset plan as text for people, with the reasons for each proposal. */
public final class PlanText {
    private PlanText() {}

    /** The plan as text. */
    public static String of(ResetPlan p) {
        StringBuilder b = new StringBuilder();
        b.append("Plan for the next reset of ")
                .append(p.wall())
                .append(" (")
                .append(p.gym())
                .append(", ")
                .append(p.on())
                .append("): ")
                .append(p.routes())
                .append(' ')
                .append(p.discipline().word())
                .append(p.routes() == 1 ? " route" : " routes")
                .append('\n')
                .append('\n');
        for (String line : slotLines(p)) {
            b.append(line).append('\n');
        }
        b.append('\n')
                .append("Bring back (the share now, on ")
                .append(String.join(", ", p.baseline().walls()))
                .append(", at least ")
                .append(FigureFormat.percent(p.margin()))
                .append(" below the median of their ")
                .append(p.baseline().resets())
                .append(p.baseline().resets() == 1 ? " reset" : " resets")
                .append(" of the last twelve months):\n");
        if (p.gaps().isEmpty()) {
            b.append("  nothing: ")
                    .append(p.undefined()
                            .getOrDefault("gaps", "every category is at or above its " + "twelve-month share"))
                    .append('\n');
        }
        for (VarietyGaps.Gap g : p.gaps()) {
            b.append("  ")
                    .append(label(g))
                    .append(": ")
                    .append(FigureFormat.percent(g.standingShare()))
                    .append(" of the ")
                    .append(unit(g.field()))
                    .append(" up now, ")
                    .append(FigureFormat.percent(g.baselineShare()))
                    .append(" in the median reset\n");
        }
        b.append('\n')
                .append("Hold shapes to rest (the hand-hold shapes ")
                .append(p.wall())
                .append(" used most in its last three resets: ")
                .append(p.shapesToRest().size())
                .append(" of ")
                .append(p.shapesOnWall())
                .append(", by resets then placements; foot holds left out):\n  ");
        b.append(
                p.shapesToRest().isEmpty()
                        ? "none: " + p.undefined().get("shapes_to_rest")
                        : p.shapesToRest().entrySet().stream()
                                .map(e -> e.getKey() + " (" + e.getValue() + ")")
                                .collect(Collectors.joining(", ")));
        return b.append('\n').toString();
    }

    /** The proposed grade slots and why. */
    static List<String> slotLines(ResetPlan p) {
        List<String> out = new ArrayList<>();
        if (p.grades() == null) {
            out.add("Grade slots: none proposed: " + p.undefined().get("slots") + "; " + CliWords.remedy(p.remedy())
                    + ".");
            return out;
        }
        ResetPlan.GradeSlots gs = p.grades();
        List<String> slots = new ArrayList<>();
        for (int i = 0; i < gs.bands().size(); i++) {
            if (gs.slots()[i] > 0) {
                slots.add(gs.slots()[i] + " × " + gs.bands().get(i));
            }
        }
        out.add("Grade slots: " + String.join(", ", slots));
        out.add("  The gym's " + p.discipline().word() + " routes up that day sit "
                + Figures.GRADES_DISTANCE.text(gs.distanceNow()) + " bands from the target; with these slots in "
                + "place of " + p.wall() + "'s current routes, " + Figures.GRADES_DISTANCE.text(gs.distanceAfter())
                + " (Wasserstein-1 distance, the least any " + p.routes()
                + " slots can give" + (gs.targetIsDefault() ? "; against the example pyramid" : "") + ").");
        long restTotal = java.util.Arrays.stream(gs.rest()).sum();
        out.add("  band   up elsewhere   routes the target wants   proposed");
        for (int i = 0; i < gs.bands().size(); i++) {
            double wanted = gs.targetShares()[i] * (restTotal + p.routes());
            out.add(String.format(
                    "  %-5s  %12d   %23s   %8d",
                    gs.bands().get(i), gs.rest()[i], FigureFormat.round(wanted, 1), gs.slots()[i]));
        }
        if (gs.outsideTarget() > 0) {
            out.add("  (" + gs.outsideTarget() + " routes up elsewhere are outside the target's bands and left out.)");
        }
        return out;
    }

    private static String label(VarietyGaps.Gap g) {
        return switch (g.field()) {
            case "grip" -> "grips facing " + g.category();
            case "holds" -> g.category() + " holds";
            case "moves" -> g.category() + " (move)";
            default -> g.category() + " (style)";
        };
    }

    private static String unit(String field) {
        return switch (field) {
            case "grip" -> "hand grips";
            case "holds" -> "placements";
            case "moves" -> "listed moves";
            default -> "style tags";
        };
    }
}
