package org.variset.imports.load;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.BitSet;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.hibernate.Session;
import org.variset.imports.row.HoldRow;
import org.variset.imports.row.RouteKey;
import org.variset.imports.row.WallRow;

/**
 * Checks of a hold row against its route and wall, beyond what its own cells say: a route's seq numbers are its own
 * (a second hold 3 is an error), a position lies on the wall (beyond the wall's width or height is an error, when the
 * wall's size is known, from the walls file or the archive), and a hand hold says which way it faces (a warning: the
 * audits count it as a grip without a direction).
 *
 * <p>Positions are measured in the wall's plane, and a wall's height may be given as its vertical height: on a wall
 * leaning at an angle a, y may reach height / cos a (a 4.2 m wall at 35 degrees is 5.1 m of panel). A position may
 * pass an edge by {@value #EDGE_M} m, for rounding (both heuristics of ours, docs/spec/interchange.md).
 */
final class HoldChecks {
    /** How far past an edge a position may lie, in metres. */
    static final double EDGE_M = 0.05;

    /** How many line numbers a warning lists before it counts the rest. */
    private static final int LINES_LISTED = 8;

    private final Session session;
    private final ImportPlan plan;
    private final Map<RouteKey, BitSet> seqs = new HashMap<>();
    private final Map<List<String>, Size> sizes = new HashMap<>();
    private final Map<String, List<Integer>> undirected = new LinkedHashMap<>();

    /** A wall's size in its plane, and where it was read; null fields when unknown. */
    private record Size(Double width, Double height, String heightWords, String from) {
        /** The size with the height measured along a panel leaning at an angle (null: upright). */
        static Size of(Double width, Double height, Double angleDeg, String from) {
            double lean = angleDeg == null ? 0 : Math.min(80, Math.abs(angleDeg));
            if (height == null || lean == 0) {
                return new Size(width, height, height == null ? null : "height of " + strip(height) + " m", from);
            }
            double panel = height / Math.cos(Math.toRadians(lean));
            return new Size(
                    width,
                    panel,
                    String.format(
                            Locale.ROOT,
                            "height of %s m, %.2f m along its panel at %s degrees",
                            strip(height),
                            panel,
                            strip(angleDeg)),
                    from);
        }
    }

    HoldChecks(Session session, ImportPlan plan) {
        this.session = session;
        this.plan = plan;
    }

    /** Checks one hold of a resolved route. */
    void check(RouteKey key, HoldRow h) {
        Integer seq = h.spec().seq();
        BitSet seen = seq == null ? null : seqs.computeIfAbsent(key, k -> new BitSet());
        if (seen != null && seen.get(seq)) {
            plan.problems.add(
                    h.file(),
                    h.line(),
                    "seq",
                    "route " + key.label() + " of " + key.setOn() + " has a hold " + seq + " already (each hold of a "
                            + "route has its own seq, 1, 2, 3 in climbing order; foot holds may leave it empty)");
        } else if (seen != null) {
            seen.set(seq);
        }
        Size size = sizes.computeIfAbsent(List.of(key.gym(), key.wall()), this::size);
        if (size.width() != null) {
            beyond(h, "x_m", h.spec().xM(), size.width(), "width of " + strip(size.width()) + " m", "width", size);
        }
        beyond(h, "y_m", h.spec().yM(), size.height(), size.heightWords(), "height", size);
        if (h.spec().role().isHand() && h.spec().grips().isEmpty()) {
            undirected.computeIfAbsent(h.file(), f -> new ArrayList<>()).add(h.line());
        }
    }

    private void beyond(
            HoldRow h, String column, Double value, Double limit, String limitWords, String field, Size size) {
        if (value != null && limit != null && value > limit + EDGE_M + 1e-9) {
            plan.problems.add(
                    h.file(),
                    h.line(),
                    column,
                    strip(value) + " m is beyond the wall's " + limitWords + " (" + size.from()
                            + "); check the position, or the wall's " + field + "_m");
        }
    }

    /** The warnings: one line per file naming the hand holds with no grip direction. */
    List<String> warnings() {
        List<String> out = new ArrayList<>();
        undirected.forEach((file, lines) -> {
            String listed = String.join(
                    ", ",
                    lines.stream().limit(LINES_LISTED).map(String::valueOf).toList());
            String more = lines.size() > LINES_LISTED ? " and " + (lines.size() - LINES_LISTED) + " more" : "";
            out.add(file + ": " + lines.size() + (lines.size() == 1 ? " hand hold has" : " hand holds have")
                    + " no grip direction (line" + (lines.size() == 1 ? " " : "s ") + listed + more + "); the audits "
                    + "count " + (lines.size() == 1 ? "it" : "them") + " as grips without a direction (give grip in "
                    + "degrees, 0 = facing up)");
        });
        return out;
    }

    private Size size(List<String> gymWall) {
        WallRow row = plan.walls.get(gymWall);
        if (row != null && (row.widthM() != null || row.heightM() != null)) {
            return Size.of(row.widthM(), row.heightM(), row.angleDeg(), row.file() + ":" + row.line());
        }
        List<Object[]> found = session.createSelectionQuery(
                        "select w.widthM, w.heightM, w.angleDeg from Wall w where w.gym.name = :g and w.name = :n",
                        Object[].class)
                .setParameter("g", gymWall.get(0))
                .setParameter("n", gymWall.get(1))
                .getResultList();
        if (found.isEmpty()) {
            return new Size(null, null, null, "");
        }
        Object[] w = found.get(0);
        return Size.of((Double) w[0], (Double) w[1], (Double) w[2], "in the archive");
    }

    private static String strip(double v) {
        return new BigDecimal(Double.toString(v)).stripTrailingZeros().toPlainString();
    }
}
