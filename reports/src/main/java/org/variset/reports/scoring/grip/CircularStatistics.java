package org.variset.reports.scoring.grip;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.variset.archive.route.GripDirection;

/**
 * Descriptive circular statistics and the Rayleigh test for grip directions (docs/spec/metrics.md section 1).
 *
 * <p>For directions θ<sub>i</sub> in degrees clockwise from up, i = 1..n: C = Σ cos θ, S = Σ sin θ,
 * R = sqrt(C² + S²), mean resultant length R̄ = R / n, mean direction atan2(S, C), circular variance 1 − R̄
 * (the definition of SciPy ≥ 1.8 and of Mardia and Jupp), circular standard deviation sqrt(−2 ln R̄).
 * The Rayleigh test of uniformity: z = n R̄², p ≈ exp(sqrt(1 + 4n + 4(n² − R²)) − (1 + 2n)) (Greenwood and
 * Durand's approximation as given by Zar), clipped to [0, 1]. The axial resultant length is R̄ of the doubled
 * angles 2θ. Sectors are 45° wide and centred on the eight compass directions: sector k = floor((θ + 22.5) / 45)
 * mod 8, computed on the degree value so that rotating every grip by a multiple of 45° permutes the sectors exactly.
 *
 * <p>Edge cases: with no directed observation every figure but the counts is null; the mean direction and the
 * circular standard deviation are null when R̄ &lt; 1e-9 (two opposite grips); the Rayleigh figures are null for
 * n &lt; 2. Grips on a wall are not independent draws and gravity favours up-facing holds, so a small Rayleigh p
 * is expected on most walls and is never a finding on its own.
 *
 * <p>References:
 * <ul>
 * <li>Zar J. H. (2010), Biostatistical Analysis, 5th ed., Pearson, chapters 26-27 (Examples 26.2, 26.4, 27.1).</li>
 * <li>Mardia K. V., Jupp P. E. (2000), Directional Statistics, Wiley, DOI 10.1002/9780470316979.</li>
 * <li>Fisher N. I. (1993), Statistical Analysis of Circular Data, Cambridge University Press,
 * DOI 10.1017/CBO9780511564345.</li>
 * <li>Berens P. (2009), "CircStat: A MATLAB Toolbox for Circular Statistics", Journal of Statistical Software
 * 31(10), DOI 10.18637/jss.v031.i10.</li>
 * </ul>
 */
public final class CircularStatistics {
    /** Below this mean resultant length the mean direction is undefined (docs/spec/metrics.md). */
    static final double NO_DIRECTION = 1e-9;

    private static final int SECTORS = 8;

    private CircularStatistics() {}

    /**
     * The grip-direction figures.
     *
     * @param degrees directions of the hand-role grips, each in [0, 360)
     * @param undirected hand-role placements with no direction, counted only
     */
    public static GripStatistics of(double[] degrees, int undirected) {
        int n = degrees.length;
        Map<String, String> why = new LinkedHashMap<>();
        int[] sectors = new int[SECTORS];
        for (double d : degrees) {
            sectors[sector(d)]++;
        }
        List<Integer> sectorList = new ArrayList<>();
        for (int s : sectors) {
            sectorList.add(s);
        }
        if (n == 0) {
            return none(undirected, sectorList);
        }
        double[] cs = sums(degrees, 1);
        double r = Math.hypot(cs[0], cs[1]);
        double rBar = Math.min(1.0, r / n);
        Double mean = null;
        Double sd = null;
        if (rBar < NO_DIRECTION) {
            why.put("mean_direction_deg", "the directions cancel out (resultant length 0)");
            why.put("circular_sd_deg", "the directions cancel out (resultant length 0)");
        } else {
            mean = (Math.toDegrees(Math.atan2(cs[1], cs[0])) + 360.0) % 360.0;
            sd = Math.toDegrees(Math.sqrt(-2.0 * Math.log(rBar)));
        }
        Double z = null;
        Double p = null;
        if (n < 2) {
            why.put("rayleigh_z", "the Rayleigh test needs at least two directions");
            why.put("rayleigh_p", "the Rayleigh test needs at least two directions");
        } else {
            z = n * rBar * rBar;
            p = rayleighP(n, r);
        }
        double[] axial = sums(degrees, 2);
        double axialRBar = Math.min(1.0, Math.hypot(axial[0], axial[1]) / n);
        return new GripStatistics(
                n,
                undirected,
                rBar,
                mean,
                1.0 - rBar,
                sd,
                z,
                p,
                axialRBar,
                sectorList,
                sectorEntropy(sectors, n),
                (sectors[0] + sectors[4]) / (double) n,
                (sectors[2] + sectors[6]) / (double) n,
                why);
    }

    /** The figures of a set with no directed hand grip: every one undefined, with the reason. */
    private static GripStatistics none(int undirected, List<Integer> sectorList) {
        Map<String, String> why = new LinkedHashMap<>();
        for (String key : List.of(
                "resultant_length",
                "mean_direction_deg",
                "circular_variance",
                "circular_sd_deg",
                "rayleigh_z",
                "rayleigh_p",
                "axial_resultant_length",
                "sector_entropy",
                "horizontal_edge_share",
                "vertical_edge_share")) {
            why.put(key, "no hand hold with a grip direction");
        }
        return new GripStatistics(
                0, undirected, null, null, null, null, null, null, null, sectorList, null, null, null, why);
    }

    /** The direction sector k faces, as a word ({@code up}, {@code down-left}); see {@link GripDirection}. */
    public static String sectorWord(int k) {
        return GripDirection.sectorWord(k);
    }

    /** Sector k = floor((θ + 22.5) / 45) mod 8, on the degree value (docs/spec/metrics.md); see {@link GripDirection}. */
    public static int sector(double degrees) {
        return GripDirection.sector(degrees);
    }

    /**
     * The Rayleigh test's p-value, Greenwood and Durand's approximation (Zar 2010, section 27.1):
     * exp(sqrt(1 + 4n + 4(n² − R²)) − (1 + 2n)), clipped to [0, 1].
     */
    static double rayleighP(int n, double r) {
        double p = Math.exp(Math.sqrt(1.0 + 4.0 * n + 4.0 * ((double) n * n - r * r)) - (1.0 + 2.0 * n));
        return Math.max(0.0, Math.min(1.0, p));
    }

    /** Σ cos(kθ) and Σ sin(kθ), for the plain (k = 1) or doubled (k = 2) angles. */
    private static double[] sums(double[] degrees, int k) {
        double c = 0;
        double s = 0;
        for (double d : degrees) {
            double t = Math.toRadians(k * d);
            c += Math.cos(t);
            s += Math.sin(t);
        }
        return new double[] {c, s};
    }

    /**
     * Shannon entropy of the sector shares (natural log) divided by ln 8: 0 one sector, 1 all eight equal. The
     * counts are summed in sorted order, so a permutation of the sectors gives the same value to the last bit.
     */
    private static double sectorEntropy(int[] sectors, int n) {
        double h = 0;
        int[] sorted = sectors.clone();
        java.util.Arrays.sort(sorted);
        for (int c : sorted) {
            if (c > 0) {
                double q = c / (double) n;
                h -= q * Math.log(q);
            }
        }
        return h / Math.log(SECTORS);
    }
}
