package org.variset.reports.scoring.line;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/**
 * The line through a route's hand holds in climbing order (docs/spec/metrics.md section 6). Path length L is the sum of the
 * straight segments; c is the perimeter of the holds' convex hull (for collinear points, twice their extent); the
 * geometric index of entropy is GIE = ln(2L / c): 0 for a straight line, larger for a wandering one. A span longer
 * than k × climber height is flagged, a heuristic (arm span is close to height in most adults; common practice, no
 * source).
 *
 * <p>This is an adaptation ({@link #ADAPTATION}): the published index is computed on a climber's path.
 *
 * <p>Edge cases: fewer than three hand holds, or any without a position, give no GIE (null).
 *
 * <p>References:
 * <ul>
 * <li>Cordier P., Mendès France M., Pailhous J., Bolon P. (1994), "Entropy as a global variable of the learning
 * process", Human Movement Science 13:745-763, DOI 10.1016/0167-9457(94)90016-7.</li>
 * <li>Watts P. et al. (2016), International Journal of Exercise Science 9(2) (natural logarithm).</li>
 * <li>Andrew A. M. (1979), "Another efficient algorithm for convex hulls in two dimensions", Information
 * Processing Letters 9(5):216-219, DOI 10.1016/0020-0190(79)90072-3 (the monotone chain used here).</li>
 * </ul>
 */
public final class RouteLine {
    /** What the index is here, beside what it is in the literature, for every place that shows it. */
    public static final String ADAPTATION = "an adaptation: the published index is computed on a climber's hip or "
            + "centre-of-mass path as they climb; here it is computed on the line through a route's hand holds, so its "
            + "values are not comparable with published ones";

    private RouteLine() {}

    /** The path length: the sum of straight segments between consecutive points. */
    public static double pathLength(List<Point> p) {
        double l = 0;
        for (int i = 1; i < p.size(); i++) {
            l += p.get(i - 1).distance(p.get(i));
        }
        return l;
    }

    /** The perimeter of the points' convex hull; for collinear points twice their extent. */
    public static double hullPerimeter(List<Point> points) {
        List<Point> hull = hull(points);
        if (hull.size() < 2) {
            return 0;
        }
        double c = 0;
        for (int i = 0; i < hull.size(); i++) {
            c += hull.get(i).distance(hull.get((i + 1) % hull.size()));
        }
        return c;
    }

    /** GIE = ln(2L / c), or null for fewer than three points or no extent. */
    public static Double gie(List<Point> points) {
        if (points.size() < 3) {
            return null;
        }
        double c = hullPerimeter(points);
        if (c == 0) {
            return null;
        }
        return Math.log(2 * pathLength(points) / c);
    }

    /** The distances between consecutive points. */
    public static List<Double> spans(List<Point> p) {
        List<Double> out = new ArrayList<>();
        for (int i = 1; i < p.size(); i++) {
            out.add(p.get(i - 1).distance(p.get(i)));
        }
        return out;
    }

    /** The indexes of spans longer than k × height (a heuristic of ours; see the class comment). */
    public static List<Integer> longSpans(List<Point> p, double k, double heightM) {
        List<Double> s = spans(p);
        List<Integer> out = new ArrayList<>();
        for (int i = 0; i < s.size(); i++) {
            if (s.get(i) > k * heightM) {
                out.add(i);
            }
        }
        return out;
    }

    /** Andrew's monotone chain; collinear points give the two extremes. */
    static List<Point> hull(List<Point> points) {
        List<Point> p = new ArrayList<>(points.stream().distinct().toList());
        p.sort(Comparator.comparingDouble(Point::x).thenComparingDouble(Point::y));
        if (p.size() < 3) {
            return p;
        }
        List<Point> lower = half(p);
        List<Point> reversed = new ArrayList<>(p);
        java.util.Collections.reverse(reversed);
        List<Point> upper = half(reversed);
        lower.remove(lower.size() - 1);
        upper.remove(upper.size() - 1);
        lower.addAll(upper);
        return lower;
    }

    private static List<Point> half(List<Point> sorted) {
        List<Point> h = new ArrayList<>();
        for (Point q : sorted) {
            while (h.size() >= 2 && cross(h.get(h.size() - 2), h.get(h.size() - 1), q) <= 0) {
                h.remove(h.size() - 1);
            }
            h.add(q);
        }
        return h;
    }

    private static double cross(Point o, Point a, Point b) {
        return (a.x() - o.x()) * (b.y() - o.y()) - (a.y() - o.y()) * (b.x() - o.x());
    }
}
