package org.variset.reports.scoring.line;

/**
 * A hold's position on the wall in metres from its bottom-left corner.
 *
 * @param x metres to the right
 * @param y metres up
 */
public record Point(double x, double y) {
    /** The straight distance to another point. */
    public double distance(Point o) {
        return Math.hypot(x - o.x, y - o.y);
    }
}
