package org.variset.reports.plan;

import java.util.Arrays;

/**
 * Chooses n grade slots for a reset so that the gym's standing set after it is as close as possible to the target,
 * in the Wasserstein-1 distance of docs/spec/metrics.md section 3.
 *
 * <p>With bands k = 1..K, the rest of the standing set's counts c<sub>k</sub> (M routes), target shares
 * t<sub>k</sub> and slot counts x<sub>k</sub> (Σ x = n), write C, X, T for the cumulative sums. The distance after
 * the reset is W(x) = Σ<sub>k</sub> |(C<sub>k</sub> + X<sub>k</sub>) / (M + n) − T<sub>k</sub>|. Each term depends
 * on X<sub>k</sub> alone and X is any nondecreasing integer sequence ending at n, so a dynamic programme over
 * (k, X<sub>k</sub>) finds the exact minimum in O(K n) steps (a running minimum over the previous band). Ties within
 * 1e-12 are broken by the distance to the wall's previous mix scaled to n routes, Σ<sub>k</sub> |X<sub>k</sub> −
 * n P<sub>k</sub>| (P the previous mix's cumulative shares), then towards easier slots.
 *
 * <p>References: Villani C. (2009), Optimal Transport: Old and New, Springer, DOI 10.1007/978-3-540-71050-9 (the
 * one-dimensional distance as the area between distribution functions); Bellman R. (1957), Dynamic Programming,
 * Princeton University Press.
 */
public final class GradeSlotPlanner {
    private static final double TIE = 1e-12;

    private GradeSlotPlanner() {}

    /**
     * The chosen slots.
     *
     * @param slots slot count per band, summing to n
     * @param distanceAfter W of the standing set after the reset
     * @param distanceToPrevious the tie-break distance to the previous mix (0 without one)
     */
    public record Result(int[] slots, double distanceAfter, double distanceToPrevious) {}

    /**
     * Plans n slots.
     *
     * @param rest routes per band of the standing set without the wall (target bands only)
     * @param target target shares per band (any positive scale, normalised here)
     * @param n the number of routes the reset will bring, at least 1
     * @param previous routes per band of the wall's previous reset, or all zeros without one
     * @throws IllegalArgumentException for n below 1, lengths that differ, or a target without a positive share
     */
    public static Result plan(long[] rest, double[] target, int n, long[] previous) {
        int k = rest.length;
        if (n < 1 || target.length != k || previous.length != k || k == 0) {
            throw new IllegalArgumentException("n must be at least 1 and every array must have one value per band");
        }
        double total = Arrays.stream(target).sum();
        if (!(total > 0)) {
            throw new IllegalArgumentException("the target has no positive share");
        }
        long m = Arrays.stream(rest).sum();
        long prevTotal = Arrays.stream(previous).sum();
        double[] cum = new double[k];
        double[] tCum = new double[k];
        double[] pCum = new double[k];
        for (int b = 0; b < k; b++) {
            cum[b] = (b > 0 ? cum[b - 1] : 0) + rest[b];
            tCum[b] = (b > 0 ? tCum[b - 1] : 0) + target[b] / total;
            pCum[b] = (b > 0 ? pCum[b - 1] : 0) + (prevTotal == 0 ? 0 : previous[b] / (double) prevTotal);
        }
        // best[b][x]: least (distance, tie) over bands 0..b with X_b = x; from[b][x]: the X_{b-1} it came from.
        double[][] dist = new double[k][n + 1];
        double[][] tie = new double[k][n + 1];
        int[][] from = new int[k][n + 1];
        for (int b = 0; b < k; b++) {
            int bestY = 0;
            for (int x = 0; x <= n; x++) {
                if (b > 0 && better(dist[b - 1][x], tie[b - 1][x], dist[b - 1][bestY], tie[b - 1][bestY])) {
                    bestY = x;
                }
                double term = Math.abs((cum[b] + x) / (m + n) - tCum[b]);
                double tieTerm = prevTotal == 0 ? 0 : Math.abs(x - n * pCum[b]);
                dist[b][x] = term + (b > 0 ? dist[b - 1][bestY] : 0);
                tie[b][x] = tieTerm + (b > 0 ? tie[b - 1][bestY] : 0);
                from[b][x] = bestY;
            }
        }
        int[] slots = new int[k];
        int x = n;
        for (int b = k - 1; b >= 0; b--) {
            int y = b > 0 ? from[b][x] : 0;
            slots[b] = x - y;
            x = y;
        }
        return new Result(slots, dist[k - 1][n], tie[k - 1][n]);
    }

    /**
     * The Wasserstein-1 distance of the standing set (rest plus slots) to the target, directly from the definition
     * (for callers and tests).
     */
    public static double distance(long[] rest, int[] slots, double[] target) {
        double total = Arrays.stream(target).sum();
        double m = Arrays.stream(rest).sum() + Arrays.stream(slots).sum();
        double f = 0;
        double t = 0;
        double w = 0;
        for (int b = 0; b < rest.length; b++) {
            f += (rest[b] + slots[b]) / m;
            t += target[b] / total;
            w += Math.abs(f - t);
        }
        return w;
    }

    /**
     * Lexicographic: a smaller distance, or within 1e-12 a smaller tie-break; on a full tie the later candidate (a
     * larger X<sub>b-1</sub>: more slots in easier bands) wins.
     */
    private static boolean better(double d, double t, double bestD, double bestT) {
        return d < bestD - TIE || Math.abs(d - bestD) <= TIE && t <= bestT + TIE;
    }
}
