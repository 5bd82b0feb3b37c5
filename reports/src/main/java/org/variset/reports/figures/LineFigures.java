package org.variset.reports.figures;

import java.util.DoubleSummaryStatistics;
import java.util.List;
import java.util.Objects;
import org.variset.archive.read.RouteRecord;

/**
 * Route lines of a set, summarised (docs/spec/metrics.md section 6; JSON key {@code line}).
 *
 * @param routes each route's line, in the set's order
 * @param withGie routes with a geometric index of entropy
 * @param gieMean mean GIE over those routes, or null when none has one
 * @param gieMin the least, or null
 * @param gieMax the greatest, or null
 * @param reachK the span factor k used
 * @param reachHeightM the climber height used
 */
public record LineFigures(
        List<RouteLineFigures> routes,
        int withGie,
        Double gieMean,
        Double gieMin,
        Double gieMax,
        double reachK,
        double reachHeightM) {

    /** The lines of the routes, spans checked against k × height. */
    public static LineFigures of(List<RouteRecord> set, double k, double heightM) {
        List<RouteLineFigures> lines =
                set.stream().map(r -> RouteLineFigures.of(r, k, heightM)).toList();
        DoubleSummaryStatistics s = lines.stream()
                .map(RouteLineFigures::gie)
                .filter(Objects::nonNull)
                .mapToDouble(Double::doubleValue)
                .summaryStatistics();
        boolean any = s.getCount() > 0;
        return new LineFigures(
                lines,
                (int) s.getCount(),
                any ? s.getAverage() : null,
                any ? s.getMin() : null,
                any ? s.getMax() : null,
                k,
                heightM);
    }

    /** The routes with at least one span flagged. */
    public List<RouteLineFigures> flagged() {
        return routes.stream().filter(r -> !r.longSpans().isEmpty()).toList();
    }
}
