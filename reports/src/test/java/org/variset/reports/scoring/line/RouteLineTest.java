package org.variset.reports.scoring.line;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.junit.jupiter.api.Test;

class RouteLineTest {
    private static List<Point> pts(double... xy) {
        java.util.List<Point> out = new java.util.ArrayList<>();
        for (int i = 0; i < xy.length; i += 2) {
            out.add(new Point(xy[i], xy[i + 1]));
        }
        return out;
    }

    /** docs/spec/metrics.md section 6 check values: straight 0, zig-zag 0.2480383, L-shape 0.1541507 (7 decimals). */
    @Test
    void matchesTheSpecsCheckValues() {
        assertThat(RouteLine.gie(pts(0, 0, 0, 1, 0, 2, 0, 4))).isCloseTo(0, within(1e-12));
        assertThat(RouteLine.gie(pts(0, 0, 1, 1, 0, 2, 1, 3, 0, 4))).isCloseTo(0.2480383, within(5e-8));
        assertThat(RouteLine.gie(pts(0, 0, 3, 0, 3, 4))).isCloseTo(0.1541507, within(5e-8));
    }

    /** A 3-4-5 triangle has perimeter 12 (Pythagoras); a segment's hull is twice its length. */
    @Test
    void measuresHullsIncludingDegenerateOnes() {
        assertThat(RouteLine.hullPerimeter(pts(0, 0, 3, 0, 3, 4, 1, 1))).isCloseTo(12, within(1e-12));
        assertThat(RouteLine.hullPerimeter(pts(0, 0, 0, 2, 0, 5))).isCloseTo(10, within(1e-12));
        assertThat(RouteLine.hullPerimeter(pts(1, 1, 1, 1))).isZero();
    }

    @Test
    void hasNoIndexForFewerThanThreeHoldsOrNoExtent() {
        assertThat(RouteLine.gie(pts(0, 0, 1, 1))).isNull();
        assertThat(RouteLine.gie(pts(1, 1, 1, 1, 1, 1))).isNull();
    }

    @Test
    void flagsSpansLongerThanTheClimbersHeight() {
        assertThat(RouteLine.longSpans(pts(0, 0, 0, 1.5, 0, 3.2), 1.0, 1.6)).containsExactly(1);
        assertThat(RouteLine.spans(pts(0, 0, 3, 4))).containsExactly(5.0);
    }
}
