package org.variset.reports.scoring.repetition;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;

/**
 * The evidence that one route repeats another, as a setter weighs it: the same hold shapes in the same layout (after
 * the best shift along the wall, since a repeat is often set a little to one side), the same run of moves, the same
 * grade band, the same wall. The feature set's Jaccard index (docs/spec/metrics.md section 5) proposes candidates;
 * this decides which are repeats. The rule and its thresholds are heuristics of ours, measured on planted cases
 * ({@code RepeatEvidenceTest}):
 * <ul>
 * <li>when both routes name the shapes of at least {@value #MIN_SHAPES} hand holds, they repeat when at least
 * {@value #MIN_SHAPES} shapes, and at least half of those of the route with fewer, are shared and not set apart: a
 * shared shape placed on both routes must lie within {@value #TOLERANCE_M} m of where the shift puts it (different
 * physical holds say "not a repeat", whatever the features);</li>
 * <li>otherwise, when they share a grade band and a run of at least two moves that covers the shorter sequence (or
 * of three moves or more).</li>
 * </ul>
 *
 * @param shapesA hand holds of the first route that name their shape
 * @param shapesB the same of the second
 * @param sharedShapes shapes both use (a shape used twice counts twice only if both use it twice)
 * @param placed shared shapes placed on both routes
 * @param placedAlike of those, how many lie within the tolerance after the shift
 * @param shiftM the shift in metres (the median offset of the placed shared shapes), or null when none is placed
 * @param commonMoves the longest run of moves both routes list in the same order
 * @param shorterMoves how many moves the route with fewer lists
 * @param sameGradeBand true when both have the same grade band
 * @param gradeBand the first route's grade band, or null
 * @param sameWall true when both are on the same wall
 */
public record RepeatEvidence(
        int shapesA,
        int shapesB,
        int sharedShapes,
        int placed,
        int placedAlike,
        Double shiftM,
        List<String> commonMoves,
        int shorterMoves,
        boolean sameGradeBand,
        String gradeBand,
        boolean sameWall) {

    /** Hand holds with a named shape each route needs before shapes decide. */
    public static final int MIN_SHAPES = 3;
    /** How far a shared shape may lie from where the shift puts it, in metres. */
    public static final double TOLERANCE_M = 0.2;
    /** The share of the smaller route's shapes that must be shared. */
    public static final double SHAPE_SHARE = 0.5;

    /** The evidence between two routes. */
    public static RepeatEvidence of(RouteEvidence a, RouteEvidence b) {
        List<RouteEvidence.Shape[]> pairs = matchShapes(a.shapes(), b.shapes());
        List<double[]> offsets = new ArrayList<>();
        for (RouteEvidence.Shape[] p : pairs) {
            if (p[0].placed() && p[1].placed()) {
                offsets.add(new double[] {p[1].x() - p[0].x(), p[1].y() - p[0].y()});
            }
        }
        Double shift = null;
        int alike = 0;
        if (!offsets.isEmpty()) {
            double dx = median(offsets.stream().mapToDouble(o -> o[0]).toArray());
            double dy = median(offsets.stream().mapToDouble(o -> o[1]).toArray());
            shift = Math.hypot(dx, dy);
            for (double[] o : offsets) {
                if (Math.hypot(o[0] - dx, o[1] - dy) <= TOLERANCE_M + 1e-9) {
                    alike++;
                }
            }
        }
        boolean sameBand = a.gradeBand() != null && a.gradeBand().equals(b.gradeBand());
        return new RepeatEvidence(
                a.shapes().size(),
                b.shapes().size(),
                pairs.size(),
                offsets.size(),
                alike,
                shift,
                longestCommonRun(a.moves(), b.moves()),
                Math.min(a.moves().size(), b.moves().size()),
                sameBand,
                a.gradeBand(),
                !a.wall().isEmpty() && a.wall().equals(b.wall()));
    }

    /** True when both routes name enough shapes for the shapes to decide. */
    public boolean shapesDecide() {
        return shapesA >= MIN_SHAPES && shapesB >= MIN_SHAPES;
    }

    /** Shared shapes that are not set apart: placed alike, or not placed on both routes. */
    public int sharedInPlace() {
        return sharedShapes - (placed - placedAlike);
    }

    /** True when enough shapes are shared and, where placed, in the same layout. */
    public boolean sameShapes() {
        double needed = Math.max(MIN_SHAPES, SHAPE_SHARE * Math.min(shapesA, shapesB));
        return shapesDecide() && sharedInPlace() >= needed;
    }

    /** True when the routes share a run of moves long enough to call it the same sequence. */
    public boolean sameSequence() {
        return commonMoves.size() >= 3 || commonMoves.size() >= 2 && commonMoves.size() >= shorterMoves;
    }

    /** The verdict: does the evidence make the pair a repeat? */
    public boolean isRepeat() {
        return shapesDecide() ? sameShapes() : sameGradeBand && sameSequence();
    }

    /** The evidence in words: "same 7 of 8 hold shapes in the same layout (shifted 0.6 m), same moves ...". */
    public String words() {
        List<String> parts = new ArrayList<>();
        if (shapesDecide()) {
            int of = Math.min(shapesA, shapesB);
            if (placed > 0) {
                String shift = shiftM != null && shiftM >= 0.05
                        ? " once shifted " + String.format(Locale.ROOT, "%.1f", shiftM) + " m"
                        : "";
                String within = " within " + Math.round(TOLERANCE_M * 100) + " cm" + shift;
                parts.add(
                        placed == sharedShapes
                                ? "same " + sharedInPlace() + " of " + of + " hold shapes" + within
                                : "same " + sharedInPlace() + " of " + of + " hold shapes (" + placedAlike + " of "
                                        + placed + " placed on both lie" + within + ")");
            } else {
                parts.add("same " + sharedShapes + " of " + of + " hold shapes");
            }
        }
        if (!commonMoves.isEmpty()) {
            parts.add("same " + (commonMoves.size() == 1 ? "move " : "moves ") + String.join(" > ", commonMoves));
        }
        if (sameGradeBand && gradeBand != null) {
            parts.add("same grade band " + gradeBand);
        }
        if (sameWall) {
            parts.add("same wall");
        }
        if (!shapesDecide()) {
            parts.add("no hold shapes recorded to compare");
        }
        return String.join(", ", parts);
    }

    /** Pairs of placements with the same shape, matched in sequence order. */
    private static List<RouteEvidence.Shape[]> matchShapes(List<RouteEvidence.Shape> a, List<RouteEvidence.Shape> b) {
        List<RouteEvidence.Shape> left = new ArrayList<>(b);
        List<RouteEvidence.Shape[]> out = new ArrayList<>();
        for (RouteEvidence.Shape s : a) {
            for (int i = 0; i < left.size(); i++) {
                if (left.get(i).ref().equals(s.ref())) {
                    out.add(new RouteEvidence.Shape[] {s, left.remove(i)});
                    break;
                }
            }
        }
        return out;
    }

    /** The longest run of consecutive moves both lists hold in the same order. */
    static List<String> longestCommonRun(List<String> a, List<String> b) {
        int best = 0;
        int end = 0;
        int[][] run = new int[a.size() + 1][b.size() + 1];
        for (int i = 1; i <= a.size(); i++) {
            for (int j = 1; j <= b.size(); j++) {
                if (a.get(i - 1).equals(b.get(j - 1))) {
                    run[i][j] = run[i - 1][j - 1] + 1;
                    if (run[i][j] > best) {
                        best = run[i][j];
                        end = i;
                    }
                }
            }
        }
        return List.copyOf(a.subList(end - best, end));
    }

    private static double median(double[] v) {
        double[] s = v.clone();
        Arrays.sort(s);
        int n = s.length;
        return n % 2 == 1 ? s[n / 2] : (s[n / 2 - 1] + s[n / 2]) / 2;
    }
}
