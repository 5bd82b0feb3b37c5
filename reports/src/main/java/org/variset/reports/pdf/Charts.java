package org.variset.reports.pdf;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Shape;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Rectangle2D;
import java.text.DecimalFormat;
import java.time.LocalDate;
import java.util.Map;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.CategoryAxis;
import org.jfree.chart.axis.CategoryLabelPositions;
import org.jfree.chart.axis.DateAxis;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.labels.StandardCategoryItemLabelGenerator;
import org.jfree.chart.plot.CategoryPlot;
import org.jfree.chart.plot.PlotOrientation;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.category.BarRenderer;
import org.jfree.chart.renderer.category.StandardBarPainter;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.title.LegendTitle;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.data.category.DefaultCategoryDataset;
import org.jfree.data.time.Day;
import org.jfree.data.time.TimeSeries;
import org.jfree.data.time.TimeSeriesCollection;

/** Bar and line charts in the document's fonts and palette, every bar labelled with its value. */
final class Charts {
    private static final Shape[] MARKERS = {
        new Ellipse2D.Double(-3, -3, 6, 6),
        new Rectangle2D.Double(-3, -3, 6, 6),
        new java.awt.Polygon(new int[] {0, 3, -3}, new int[] {-4, 3, 3}, 3),
        new Rectangle2D.Double(-2, -4, 4, 8)
    };
    private static final float[][] DASHES = {null, {5f, 3f}, {1.5f, 2.5f}, {7f, 2f, 1.5f, 2f}};

    private Charts() {}

    /** Bars of one series: category to value, labelled; {@code percent} formats the axis and labels as shares. */
    static JFreeChart bars(PdfFonts f, String valueAxis, Map<String, ? extends Number> values, boolean percent) {
        DefaultCategoryDataset d = new DefaultCategoryDataset();
        values.forEach((k, v) -> d.addValue(v, valueAxis, k));
        return style(f, new JFreeChart(null, f.awt(8, false), plot(f, d, valueAxis, percent), false), false);
    }

    /** Observed shares beside target shares per band: two labelled series, told apart by fill and legend. */
    static JFreeChart barsAgainstTarget(PdfFonts f, Map<String, Double> observed, Map<String, Double> target) {
        DefaultCategoryDataset d = new DefaultCategoryDataset();
        observed.forEach((k, v) -> d.addValue(v, "routes", k));
        target.forEach((k, v) -> d.addValue(v, "target", k));
        JFreeChart c = new JFreeChart(null, f.awt(8, false), plot(f, d, "share of routes", true), true);
        return style(f, c, true);
    }

    /** Month-end lines of several figures over days, told apart by colour, dash and marker. */
    static JFreeChart lines(PdfFonts f, String valueAxis, Map<String, Map<LocalDate, Double>> series) {
        TimeSeriesCollection data = new TimeSeriesCollection();
        series.forEach((name, points) -> {
            TimeSeries s = new TimeSeries(name);
            points.forEach((day, v) -> {
                if (v != null) {
                    s.addOrUpdate(new Day(day.getDayOfMonth(), day.getMonthValue(), day.getYear()), v);
                }
            });
            data.addSeries(s);
        });
        DateAxis x = new DateAxis();
        x.setDateFormatOverride(new java.text.SimpleDateFormat("MMM yyyy", java.util.Locale.ENGLISH));
        long months = series.values().stream()
                .flatMap(m -> m.keySet().stream())
                .distinct()
                .count();
        x.setTickUnit(new org.jfree.chart.axis.DateTickUnit(
                org.jfree.chart.axis.DateTickUnitType.MONTH, (int) Math.max(1, (months + 11) / 12)));
        NumberAxis y = new NumberAxis(valueAxis);
        XYLineAndShapeRenderer r = new XYLineAndShapeRenderer(true, true);
        for (int i = 0; i < series.size(); i++) {
            r.setSeriesPaint(i, Palette.SERIES[i % Palette.SERIES.length]);
            r.setSeriesShape(i, MARKERS[i % MARKERS.length]);
            float[] dash = DASHES[i % DASHES.length];
            r.setSeriesStroke(
                    i,
                    dash == null
                            ? new BasicStroke(1.4f)
                            : new BasicStroke(1.4f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f, dash, 0f));
        }
        XYPlot plot = new XYPlot(data, x, y, r);
        axes(f, x, y);
        plot.setBackgroundPaint(Color.WHITE);
        plot.setRangeGridlinePaint(Palette.SHADE);
        plot.setDomainGridlinePaint(Palette.SHADE);
        return style(f, new JFreeChart(null, f.awt(8, false), plot, true), true);
    }

    private static CategoryPlot plot(PdfFonts f, DefaultCategoryDataset d, String valueAxis, boolean percent) {
        CategoryAxis x = new CategoryAxis();
        x.setCategoryLabelPositions(
                d.getColumnCount() > 8 ? CategoryLabelPositions.UP_45 : CategoryLabelPositions.STANDARD);
        NumberAxis y = new NumberAxis(valueAxis);
        if (percent) {
            y.setNumberFormatOverride(new DecimalFormat("0%"));
        } else {
            y.setStandardTickUnits(NumberAxis.createIntegerTickUnits());
        }
        axes(f, x, y);
        BarRenderer r = new BarRenderer();
        r.setBarPainter(new StandardBarPainter());
        r.setShadowVisible(false);
        r.setItemMargin(0.05);
        r.setDefaultItemLabelGenerator(new StandardCategoryItemLabelGenerator(
                "{2}", percent ? new DecimalFormat("0%") : new DecimalFormat("0.##")));
        r.setDefaultItemLabelsVisible(true);
        r.setDefaultItemLabelFont(f.awt(6.5f, false));
        r.setSeriesPaint(0, Palette.BLUE);
        r.setSeriesPaint(1, Palette.ORANGE);
        r.setSeriesOutlinePaint(1, Palette.INK);
        r.setDrawBarOutline(true);
        r.setSeriesOutlinePaint(0, Palette.INK);
        CategoryPlot p = new CategoryPlot(d, x, y, r);
        p.setOrientation(PlotOrientation.VERTICAL);
        p.setBackgroundPaint(Color.WHITE);
        p.setRangeGridlinePaint(Palette.SHADE);
        y.setUpperMargin(0.15);
        return p;
    }

    private static void axes(PdfFonts f, org.jfree.chart.axis.Axis x, org.jfree.chart.axis.Axis y) {
        Font label = f.awt(7.5f, false);
        Font tick = f.awt(7f, false);
        for (org.jfree.chart.axis.Axis a : new org.jfree.chart.axis.Axis[] {x, y}) {
            a.setLabelFont(label);
            a.setTickLabelFont(tick);
            a.setLabelPaint(Palette.INK);
            a.setTickLabelPaint(Palette.INK);
        }
    }

    private static JFreeChart style(PdfFonts f, JFreeChart c, boolean legend) {
        c.setBackgroundPaint(Color.WHITE);
        c.setAntiAlias(false);
        if (legend && c.getLegend() != null) {
            LegendTitle l = c.getLegend();
            l.setItemFont(f.awt(7.5f, false));
            l.setPosition(RectangleEdge.TOP);
            l.setFrame(org.jfree.chart.block.BlockBorder.NONE);
        }
        return c;
    }
}
