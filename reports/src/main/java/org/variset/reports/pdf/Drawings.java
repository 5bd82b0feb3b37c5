package org.variset.reports.pdf;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.geom.Arc2D;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Line2D;
import java.awt.geom.Path2D;
import java.util.List;
import org.variset.archive.route.GripDirection;
import org.variset.reports.catalogue.Figures;
import org.variset.reports.scoring.grip.GripStatistics;
import org.variset.reports.scoring.line.Point;

/** Drawings no chart library makes: the grip-direction rose and the sketch of a route's line. */
final class Drawings {
    private Drawings() {}

    /**
     * A rose of the eight grip sectors (docs/spec/metrics.md section 1): each wedge 45° wide, centred on its direction (up at the
     * top, clockwise), its radius proportional to the square root of its count so that wedge areas compare as
     * counts (Fisher 1993, section 2.2), labelled with the count. The mean direction is an arrow whose length is the
     * mean resultant length R̄ on the same scale as the outer circle (R̄ = 1 reaches it).
     *
     * <p>Reference: Fisher N. I. (1993), Statistical Analysis of Circular Data, Cambridge University Press,
     * DOI 10.1017/CBO9780511564345.
     */
    static void rose(Graphics2D g, float w, float h, GripStatistics s, PdfFonts f) {
        double cx = w / 2.0;
        double cy = h / 2.0 + 8;
        double rMax = Math.min(w, h) / 2.0 - 26;
        int max = s.sectors().stream().mapToInt(Integer::intValue).max().orElse(0);
        g.setStroke(new BasicStroke(0.5f));
        g.setColor(Palette.SHADE);
        for (double q : new double[] {0.25, 0.5, 0.75, 1.0}) {
            g.draw(new Ellipse2D.Double(
                    cx - rMax * Math.sqrt(q),
                    cy - rMax * Math.sqrt(q),
                    2 * rMax * Math.sqrt(q),
                    2 * rMax * Math.sqrt(q)));
        }
        g.setFont(f.awt(7f, false));
        for (int k = 0; k < 8; k++) {
            int n = s.sectors().get(k);
            double r = max == 0 ? 0 : rMax * Math.sqrt(n / (double) max);
            // Java2D arcs run counter-clockwise from 3 o'clock; sector k is centred 45k degrees clockwise from up.
            double start = 90 - 45 * k - 22.5;
            if (r > 0) {
                Arc2D wedge = new Arc2D.Double(cx - r, cy - r, 2 * r, 2 * r, start, 45, Arc2D.PIE);
                g.setColor(Palette.SKY);
                g.fill(wedge);
                g.setColor(Palette.INK);
                g.draw(wedge);
            }
            double a = Math.toRadians(45 * k);
            double lr = rMax + 12;
            String label = GripDirection.sectorWord(k) + " " + n;
            int tw = g.getFontMetrics().stringWidth(label);
            g.setColor(Palette.INK);
            g.drawString(label, (float) (cx + lr * Math.sin(a) - tw / 2.0), (float) (cy - lr * Math.cos(a) + 3));
        }
        if (s.meanDirectionDeg() != null && s.resultantLength() != null) {
            double a = Math.toRadians(s.meanDirectionDeg());
            double len = rMax * s.resultantLength();
            double x2 = cx + len * Math.sin(a);
            double y2 = cy - len * Math.cos(a);
            g.setColor(Palette.VERMILLION);
            g.setStroke(new BasicStroke(2f));
            g.draw(new Line2D.Double(cx, cy, x2, y2));
            Path2D head = new Path2D.Double();
            head.moveTo(x2, y2);
            head.lineTo(x2 - 6 * Math.sin(a - 0.4), y2 + 6 * Math.cos(a - 0.4));
            head.lineTo(x2 - 6 * Math.sin(a + 0.4), y2 + 6 * Math.cos(a + 0.4));
            head.closePath();
            g.fill(head);
            g.setColor(Palette.INK);
            g.drawString(
                    "arrow: mean direction " + Figures.GRIP_MEAN_DIRECTION.text(s.meanDirectionDeg())
                            + "°, length R̄ = " + Figures.GRIP_RESULTANT.text(s.resultantLength()),
                    2,
                    9);
        }
    }

    /** How much taller than wide a route's sketch is, margins included (1 for a square). */
    static double aspect(List<Point> points) {
        double w = points.stream().mapToDouble(Point::x).max().orElse(1)
                - points.stream().mapToDouble(Point::x).min().orElse(0)
                + 0.6;
        double h = points.stream().mapToDouble(Point::y).max().orElse(1)
                - points.stream().mapToDouble(Point::y).min().orElse(0)
                + 0.6;
        return h / w;
    }

    /**
     * A route's hand holds on the wall, in climbing order, scaled to fit: numbered circles joined by the line;
     * spans flagged as long are dashed and marked "long". Circles shrink when holds lie close on the page (a long
     * rope route in a small cell), and their numbers go when the circles get too small to hold them.
     */
    static void line(Graphics2D g, float w, float h, List<Point> points, List<Integer> longSpans, PdfFonts f) {
        double minX = points.stream().mapToDouble(Point::x).min().orElse(0) - 0.3;
        double maxX = points.stream().mapToDouble(Point::x).max().orElse(1) + 0.3;
        double minY = points.stream().mapToDouble(Point::y).min().orElse(0) - 0.3;
        double maxY = points.stream().mapToDouble(Point::y).max().orElse(1) + 0.3;
        double scale = Math.min((w - 8) / (maxX - minX), (h - 8) / (maxY - minY));
        java.util.function.DoubleUnaryOperator px = x -> 4 + (x - minX) * scale;
        java.util.function.DoubleUnaryOperator py = y -> h - 4 - (y - minY) * scale;
        g.setColor(Palette.SHADE);
        g.fill(new java.awt.geom.Rectangle2D.Double(0, 0, w, h));
        for (int i = 1; i < points.size(); i++) {
            boolean flagged = longSpans.contains(i - 1);
            g.setColor(flagged ? Palette.VERMILLION : Palette.INK);
            g.setStroke(
                    flagged
                            ? new BasicStroke(
                                    1.2f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f, new float[] {3f, 2f}, 0f)
                            : new BasicStroke(1f));
            Point a = points.get(i - 1);
            Point b = points.get(i);
            g.draw(new Line2D.Double(
                    px.applyAsDouble(a.x()),
                    py.applyAsDouble(a.y()),
                    px.applyAsDouble(b.x()),
                    py.applyAsDouble(b.y())));
            if (flagged) {
                g.setFont(f.awt(6f, true));
                g.drawString("long", (float) px.applyAsDouble((a.x() + b.x()) / 2) + 3, (float)
                        py.applyAsDouble((a.y() + b.y()) / 2));
            }
        }
        double closest = Double.MAX_VALUE;
        for (int i = 1; i < points.size(); i++) {
            closest = Math.min(
                    closest,
                    scale
                            * Math.hypot(
                                    points.get(i).x() - points.get(i - 1).x(),
                                    points.get(i).y() - points.get(i - 1).y()));
        }
        double r = Math.max(2, Math.min(4, closest / 2.2));
        boolean numbered = r >= 3;
        g.setFont(f.awt(r >= 3.8 ? 5.5f : 4.5f, false));
        for (int i = 0; i < points.size(); i++) {
            double x = px.applyAsDouble(points.get(i).x());
            double y = py.applyAsDouble(points.get(i).y());
            g.setColor(Color.WHITE);
            g.fill(new Ellipse2D.Double(x - r, y - r, 2 * r, 2 * r));
            g.setColor(Palette.BLUE);
            g.draw(new Ellipse2D.Double(x - r, y - r, 2 * r, 2 * r));
            // Too small for its number: the first and last are still numbered, so the line reads from its start.
            if (numbered || i == 0 || i == points.size() - 1) {
                String n = Integer.toString(i + 1);
                g.setColor(Palette.INK);
                g.drawString(n, (float) (x - g.getFontMetrics().stringWidth(n) / 2.0), (float) (y + r / 2));
            }
        }
    }
}
