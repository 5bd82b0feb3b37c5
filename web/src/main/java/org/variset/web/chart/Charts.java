package org.variset.web.chart;

import java.util.List;

/** The charts of the pages, as SVG text to put into a page as it is. */
public final class Charts {
    /** The eight directions of the grip sectors, sector 0 (faces up) first, clockwise. */
    public static final List<String> DIRECTIONS =
            List.of("up", "up-right", "right", "down-right", "down", "down-left", "left", "up-left");

    private Charts() {}

    /**
     * One bar.
     *
     * @param label what it counts (a grade, a hold type)
     * @param count how many
     * @param target the share the target expects, or null when there is no target
     */
    public record Bar(String label, double count, Double target) {}

    /**
     * Vertical bars of shares (each count over the total), with the target's share as a tick on each bar.
     *
     * @param title what the chart shows, for screen readers
     */
    public static String bars(String title, List<Bar> bars) {
        double total = bars.stream().mapToDouble(Bar::count).sum();
        double top = 0.05;
        for (Bar b : bars) {
            top = Math.max(top, total > 0 ? b.count() / total : 0);
            if (b.target() != null) {
                top = Math.max(top, b.target());
            }
        }
        double slot = 34;
        double plot = 140;
        double left = 8;
        Svg s = new Svg(left * 2 + slot * Math.max(1, bars.size()), plot + 40, title);
        s.line(left, 10 + plot, left + slot * bars.size(), 10 + plot, "axis");
        for (int i = 0; i < bars.size(); i++) {
            Bar b = bars.get(i);
            double share = total > 0 ? b.count() / total : 0;
            double h = plot * share / top;
            double x = left + i * slot;
            s.rect(x + 6, 10 + plot - h, slot - 12, h, "bar");
            if (b.target() != null) {
                double ty = 10 + plot - plot * b.target() / top;
                s.line(x + 3, ty, x + slot - 3, ty, "target");
            }
            s.text(x + slot / 2, plot + 26, "middle", "tick", b.label());
            s.text(
                    x + slot / 2,
                    10 + plot - h - 3,
                    "middle",
                    "value",
                    Svg.n(b.count()).replace(".0", ""));
        }
        return s.end();
    }

    /**
     * The rose of grip directions: one wedge per sector, its radius by the square root of its share (so that areas
     * compare as counts do), sector 0 (faces up) at the top, clockwise.
     */
    public static String rose(String title, int[] sectors) {
        int total = 0;
        int most = 1;
        for (int c : sectors) {
            total += c;
            most = Math.max(most, c);
        }
        double cx = 110;
        double cy = 110;
        double rMax = 80;
        Svg s = new Svg(220, 220, title);
        s.circle(cx, cy, rMax, "ring");
        for (int k = 0; k < sectors.length; k++) {
            double r = rMax * Math.sqrt((double) sectors[k] / most);
            double a0 = Math.toRadians(k * 45 - 22.5);
            double a1 = Math.toRadians(k * 45 + 22.5);
            // Clockwise from straight up: x = sin, y = -cos.
            s.raw("<path class=\"wedge\" d=\"M" + Svg.n(cx) + " " + Svg.n(cy)
                    + " L" + Svg.n(cx + r * Math.sin(a0)) + " " + Svg.n(cy - r * Math.cos(a0))
                    + " A" + Svg.n(r) + " " + Svg.n(r) + " 0 0 1 "
                    + Svg.n(cx + r * Math.sin(a1)) + " " + Svg.n(cy - r * Math.cos(a1)) + " Z\"/>");
            double la = Math.toRadians(k * 45);
            s.text(
                    cx + (rMax + 14) * Math.sin(la),
                    cy - (rMax + 14) * Math.cos(la) + 4,
                    "middle",
                    "tick",
                    DIRECTIONS.get(k) + " " + sectors[k]);
        }
        if (total == 0) {
            s.text(cx, cy, "middle", "value", "no directions");
        }
        return s.end();
    }

    /**
     * A hold on a sketch.
     *
     * @param x metres from the wall's left edge
     * @param y metres up from the floor
     * @param grips grip directions in degrees clockwise from up
     * @param label what it is (type, role)
     * @param foot true for a foot hold
     */
    public record Mark(double x, double y, List<Double> grips, String label, boolean foot) {}

    /** A route's holds where they are on the wall, each with a stroke per grip direction; up is up. */
    public static String sketch(String title, List<Mark> marks) {
        if (marks.isEmpty()) {
            Svg s = new Svg(240, 60, title);
            s.text(120, 34, "middle", "value", "no hold positions recorded");
            return s.end();
        }
        double minX = marks.stream().mapToDouble(Mark::x).min().orElse(0) - 0.3;
        double maxX = marks.stream().mapToDouble(Mark::x).max().orElse(1) + 0.3;
        double minY = Math.min(0, marks.stream().mapToDouble(Mark::y).min().orElse(0) - 0.3);
        double maxY = marks.stream().mapToDouble(Mark::y).max().orElse(1) + 0.3;
        double scale = 300 / Math.max(maxY - minY, maxX - minX);
        double w = (maxX - minX) * scale;
        double h = (maxY - minY) * scale;
        Svg s = new Svg(w, h, title);
        for (Mark m : marks) {
            double px = (m.x() - minX) * scale;
            double py = h - (m.y() - minY) * scale;
            s.raw("<g class=\"" + (m.foot() ? "hold foot" : "hold") + "\"><title>" + Svg.escape(m.label())
                    + "</title>");
            s.circle(px, py, m.foot() ? 4 : 7, "dot");
            for (double g : m.grips()) {
                double a = Math.toRadians(g);
                s.line(px, py, px + 14 * Math.sin(a), py - 14 * Math.cos(a), "grip");
            }
            s.raw("</g>");
        }
        return s.end();
    }
}
