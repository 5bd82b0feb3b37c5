package org.variset.web.chart;

import java.util.Locale;

/** Building SVG text: numbers with a fixed number of decimals (whatever the locale) and escaped text. */
final class Svg {
    private final StringBuilder out = new StringBuilder();

    Svg(double width, double height, String label) {
        out.append("<svg xmlns=\"http://www.w3.org/2000/svg\" viewBox=\"0 0 ")
                .append(n(width))
                .append(' ')
                .append(n(height))
                .append("\" role=\"img\" aria-label=\"")
                .append(escape(label))
                .append("\"><title>")
                .append(escape(label))
                .append("</title>");
    }

    Svg raw(String s) {
        out.append(s);
        return this;
    }

    Svg rect(double x, double y, double w, double h, String cls) {
        return raw("<rect x=\"" + n(x) + "\" y=\"" + n(y) + "\" width=\"" + n(w) + "\" height=\"" + n(h) + "\" class=\""
                + cls + "\"/>");
    }

    Svg line(double x1, double y1, double x2, double y2, String cls) {
        return raw("<line x1=\"" + n(x1) + "\" y1=\"" + n(y1) + "\" x2=\"" + n(x2) + "\" y2=\"" + n(y2) + "\" class=\""
                + cls + "\"/>");
    }

    Svg circle(double cx, double cy, double r, String cls) {
        return raw("<circle cx=\"" + n(cx) + "\" cy=\"" + n(cy) + "\" r=\"" + n(r) + "\" class=\"" + cls + "\"/>");
    }

    Svg text(double x, double y, String anchor, String cls, String text) {
        return raw("<text x=\"" + n(x) + "\" y=\"" + n(y) + "\" text-anchor=\"" + anchor + "\" class=\"" + cls + "\">"
                + escape(text) + "</text>");
    }

    String end() {
        return out + "</svg>";
    }

    static String n(double v) {
        return String.format(Locale.ROOT, "%.1f", v);
    }

    static String escape(String s) {
        StringBuilder b = new StringBuilder(s.length());
        for (char c : s.toCharArray()) {
            switch (c) {
                case '<' -> b.append("&lt;");
                case '>' -> b.append("&gt;");
                case '&' -> b.append("&amp;");
                case '"' -> b.append("&quot;");
                case '\'' -> b.append("&#39;");
                default -> b.append(c);
            }
        }
        return b.toString();
    }
}
