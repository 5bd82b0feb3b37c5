package org.variset.reports.figures;

import java.util.ArrayList;
import java.util.List;
import org.variset.archive.read.HoldRecord;
import org.variset.archive.read.RouteRecord;
import org.variset.reports.scoring.line.Point;
import org.variset.reports.scoring.line.RouteLine;

/**
 * The line of one route through its hand holds (docs/spec/metrics.md section 6).
 *
 * @param route the route's name
 * @param handHolds its hand-role placements
 * @param points their positions in climbing order, or empty when any lacks one
 * @param pathLength L in metres, or null without positions
 * @param hullPerimeter c in metres, or null without positions
 * @param gie ln(2L / c), or null (fewer than three hand holds, a missing position, or no extent)
 * @param spans distances between consecutive hand holds in metres; empty without positions
 * @param longSpans indexes into spans of those longer than k × climber height (span i joins holds i+1 and i+2)
 */
public record RouteLineFigures(
        String route,
        int handHolds,
        List<Point> points,
        Double pathLength,
        Double hullPerimeter,
        Double gie,
        List<Double> spans,
        List<Integer> longSpans) {

    /** The line of a route, with spans checked against k × height. */
    public static RouteLineFigures of(RouteRecord r, double k, double heightM) {
        List<HoldRecord> hand = r.handHoldsInOrder();
        List<Point> points = new ArrayList<>();
        for (HoldRecord h : hand) {
            if (!h.hasPosition()) {
                return new RouteLineFigures(r.name(), hand.size(), List.of(), null, null, null, List.of(), List.of());
            }
            points.add(new Point(h.xM(), h.yM()));
        }
        if (points.isEmpty()) {
            return new RouteLineFigures(r.name(), 0, List.of(), null, null, null, List.of(), List.of());
        }
        return new RouteLineFigures(
                r.name(),
                hand.size(),
                List.copyOf(points),
                RouteLine.pathLength(points),
                RouteLine.hullPerimeter(points),
                RouteLine.gie(points),
                RouteLine.spans(points),
                RouteLine.longSpans(points, k, heightM));
    }
}
