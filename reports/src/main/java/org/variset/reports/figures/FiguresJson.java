package org.variset.reports.figures;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.Map;
import org.variset.archive.grade.Discipline;
import org.variset.reports.catalogue.Figures;
import org.variset.reports.scoring.grades.GradeFigures;
import org.variset.reports.scoring.grip.GripStatistics;
import org.variset.reports.scoring.line.RouteLine;
import org.variset.reports.scoring.profile.ProfileClass;
import org.variset.reports.scoring.variety.VarietyFigures;

/**
 * Writes {@link SetFigures} under the JSON keys of docs/spec/metrics.md ({@code grip}, {@code holds}, {@code hold_shapes},
 * {@code sizes}, {@code moves}, {@code styles}, {@code angles}, {@code grades}, {@code profiles}, {@code line}),
 * unrounded; the reason for each null figure goes under {@code undefined} as {@code block.key}.
 */
public final class FiguresJson {
    private FiguresJson() {}

    /** Writes every block of the figures into o, reasons into undefined. */
    public static void write(ObjectNode o, SetFigures f, ObjectNode undefined) {
        grip(o.putObject("grip"), f.grip(), undefined);
        variety(o, Figures.HOLDS, f.holds(), undefined);
        variety(o, Figures.HOLD_SHAPES, f.holdShapes(), undefined);
        variety(o, Figures.SIZES, f.sizes(), undefined);
        variety(o, Figures.MOVES, f.moves(), undefined);
        variety(o, Figures.STYLES, f.styles(), undefined);
        variety(o, Figures.ANGLES, f.angles(), undefined);
        ObjectNode grades = o.putObject("grades");
        for (Map.Entry<Discipline, GradeFigures> e : f.grades().entrySet()) {
            grades(grades.putObject(e.getKey().word()), "grades." + e.getKey().word(), e.getValue(), undefined);
        }
        ObjectNode profiles = o.putObject("profiles");
        for (ProfileClass c : ProfileClass.values()) {
            profiles.put(c.key(), f.profiles().counts().get(c));
        }
        profiles.put("split_entropy", f.profiles().splitEntropy());
        if (f.profiles().splitEntropy() == null) {
            undefined.put("profiles.split_entropy", "no route has three or more move difficulties");
        }
        line(o.putObject("line"), f.line(), undefined);
    }

    /** Writes a map of numbers. */
    public static void map(ObjectNode o, Map<String, ? extends Number> m) {
        m.forEach((k, v) -> o.put(k, v == null ? null : v.doubleValue()));
    }

    private static void grip(ObjectNode o, GripStatistics g, ObjectNode undefined) {
        o.put("n", g.n())
                .put("undirected", g.undirected())
                .put("resultant_length", g.resultantLength())
                .put("mean_direction_deg", g.meanDirectionDeg())
                .put("circular_variance", g.circularVariance())
                .put("circular_sd_deg", g.circularSdDeg())
                .put("rayleigh_z", g.rayleighZ())
                .put("rayleigh_p", g.rayleighP())
                .put("axial_resultant_length", g.axialResultantLength());
        ArrayNode sectors = o.putArray("sectors");
        g.sectors().forEach(sectors::add);
        o.put("sector_entropy", g.sectorEntropy())
                .put("horizontal_edge_share", g.horizontalEdgeShare())
                .put("vertical_edge_share", g.verticalEdgeShare());
        g.undefined().forEach((k, why) -> undefined.put("grip." + k, why));
    }

    private static void variety(ObjectNode parent, Figures.Variety c, VarietyFigures v, ObjectNode undefined) {
        String block = c.n().key().substring(0, c.n().key().indexOf('.'));
        ObjectNode o = parent.putObject(block);
        o.put(c.n().leaf(), v.n())
                .put(c.missing().leaf(), v.missing())
                .put(c.richness().leaf(), v.richness())
                .put(c.shannon().leaf(), v.shannon())
                .put(c.pielou().leaf(), v.pielou())
                .put(c.giniSimpson().leaf(), v.giniSimpson())
                .put(c.hillN1().leaf(), v.hillN1())
                .put(c.hillN2().leaf(), v.hillN2())
                .put(c.coverage().leaf(), v.coverage());
        ObjectNode counts = o.putObject("counts");
        v.counts().forEach(counts::put);
        v.undefined().forEach((k, why) -> undefined.put(block + "." + k, why));
    }

    private static void grades(ObjectNode o, String block, GradeFigures g, ObjectNode undefined) {
        ObjectNode h = o.putObject("histogram");
        g.histogram().forEach(h::put);
        if (g.target() == null) {
            o.putNull("target");
        } else {
            map(o.putObject("target"), g.target());
        }
        o.put("outside_target", g.outsideTarget())
                .put("emd_to_target", g.emdToTarget())
                .put("chi_square", g.chiSquare())
                .put("chi_square_df", g.chiSquareDf())
                .put("chi_square_p", g.chiSquareP())
                .put("chi_square_reliable", g.chiSquareReliable());
        ArrayNode gaps = o.putArray("gaps");
        g.gaps().forEach(gaps::add);
        ArrayNode runs = o.putArray("gap_runs");
        for (GradeGaps.Run r : GradeGaps.runs(g)) {
            ArrayNode bands = runs.addObject()
                    .put("target_share", r.targetShare())
                    .put("expected_routes", r.expectedRoutes())
                    .putArray("bands");
            r.bands().forEach(bands::add);
        }
        g.undefined().forEach((k, why) -> undefined.put(block + "." + k, why));
    }

    private static void line(ObjectNode o, LineFigures l, ObjectNode undefined) {
        o.put("routes_with_gie", l.withGie())
                .put("gie_mean", l.gieMean())
                .put("gie_min", l.gieMin())
                .put("gie_max", l.gieMax())
                .put("gie_note", "GIE here is " + RouteLine.ADAPTATION)
                .put("reach_height_m", l.reachHeightM())
                .put("reach_factor", l.reachK());
        if (l.gieMean() == null) {
            undefined.put("line.gie_mean", "no route has three or more hand holds, all with positions");
        }
        ArrayNode routes = o.putArray("routes");
        for (RouteLineFigures r : l.routes()) {
            ObjectNode x = routes.addObject()
                    .put("route", r.route())
                    .put("hand_holds", r.handHolds())
                    .put("path_length", r.pathLength())
                    .put("hull_perimeter", r.hullPerimeter())
                    .put("gie", r.gie());
            ArrayNode spans = x.putArray("move_spans");
            r.spans().forEach(spans::add);
            ArrayNode flagged = x.putArray("long_spans");
            r.longSpans().forEach(flagged::add);
        }
    }
}
