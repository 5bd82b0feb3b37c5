package org.variset.reports.catalogue;

import static org.variset.reports.catalogue.Figure.Better.HIGHER;
import static org.variset.reports.catalogue.Figure.Better.LOWER;
import static org.variset.reports.catalogue.Figure.Better.NEITHER;

import java.util.ArrayList;
import java.util.Collection;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.variset.reports.catalogue.Figure.Better;
import org.variset.reports.catalogue.Figure.Unit;

/**
 * The catalogue of figures (docs/spec/metrics.md). Each entry is declared once here; {@link #of(String)} finds one
 * by its key, {@link #HEADLINE} lists those an audit sets side by side, {@link #TREND} those a trend follows month by
 * month and a chain compares.
 */
public final class Figures {
    private static final Map<String, Figure> ALL = new LinkedHashMap<>();

    private static final String S1 = "docs/spec/metrics.md §1";
    private static final String S2 = "docs/spec/metrics.md §2";
    private static final String S3 = "docs/spec/metrics.md §3";
    private static final String S5 = "docs/spec/metrics.md §5";
    private static final String S6 = "docs/spec/metrics.md §6";

    /** The composite score (§7): a heuristic of ours, always shown with its parts. */
    public static final Figure SCORE = add(
            "score.score",
            "score (0-100, heuristic)",
            "score",
            Unit.POINTS,
            0,
            HIGHER,
            "heuristic of ours: weighted mean of its parts (docs/spec/metrics.md §7)");

    /** Directed hand grips (§1). */
    public static final Figure GRIP_N =
            add("grip.n", "hand grips with a direction", "grips", Unit.COUNT, 0, NEITHER, S1);
    /** Hand holds without a direction, left out of the grip figures (§1). */
    public static final Figure GRIP_UNDIRECTED =
            add("grip.undirected", "hand holds without a direction", "undirected", Unit.COUNT, 0, NEITHER, S1);
    /** Mean resultant length R̄ (§1). */
    public static final Figure GRIP_RESULTANT = add(
            "grip.resultant_length",
            "grip resultant length",
            "resultant",
            Unit.NUMBER,
            2,
            LOWER,
            "mean resultant length (Fisher 1993, §2.3.1; " + S1 + ")");
    /** Mean direction (§1). */
    public static final Figure GRIP_MEAN_DIRECTION = add(
            "grip.mean_direction_deg",
            "mean grip direction",
            "mean dir",
            Unit.DEGREES,
            0,
            NEITHER,
            "circular mean (Zar 2010, Ex. 26.4; " + S1 + ")");
    /** Circular variance 1 − R̄ (§1). */
    public static final Figure GRIP_VARIANCE = add(
            "grip.circular_variance",
            "circular variance of grips",
            "circ var",
            Unit.NUMBER,
            2,
            HIGHER,
            "1 − R̄ (Mardia & Jupp 2000; " + S1 + ")");
    /** Circular standard deviation (§1). */
    public static final Figure GRIP_SD = add(
            "grip.circular_sd_deg",
            "circular standard deviation of grips",
            "circ sd",
            Unit.DEGREES,
            0,
            HIGHER,
            "sqrt(−2 ln R̄) (Zar 2010, eq. 26.20; " + S1 + ")");
    /** Rayleigh z (§1). */
    public static final Figure GRIP_RAYLEIGH_Z = add(
            "grip.rayleigh_z",
            "Rayleigh z of grips",
            "rayleigh z",
            Unit.NUMBER,
            2,
            NEITHER,
            "Rayleigh test (Zar 2010, §27.1; " + S1 + ")");
    /** Rayleigh p, never a finding on its own (§1). */
    public static final Figure GRIP_RAYLEIGH_P = add(
            "grip.rayleigh_p",
            "Rayleigh p of grips",
            "rayleigh p",
            Unit.PROBABILITY,
            3,
            NEITHER,
            "Greenwood-Durand approximation (Zar 2010, §27.1; " + S1 + ")");
    /** Axial resultant length (§1). */
    public static final Figure GRIP_AXIAL = add(
            "grip.axial_resultant_length",
            "grip axial resultant length",
            "axial",
            Unit.NUMBER,
            2,
            LOWER,
            "R̄ of doubled angles (Mardia & Jupp 2000, axial data; " + S1 + ")");
    /** Sector entropy (§1). */
    public static final Figure GRIP_SECTOR_ENTROPY = add(
            "grip.sector_entropy",
            "grip direction spread (sector entropy)",
            "grip sprd",
            Unit.NUMBER,
            2,
            HIGHER,
            "Shannon entropy of eight sectors / ln 8 (Shannon 1948; " + S1 + ")");
    /** Horizontal edges (§1). */
    public static final Figure GRIP_HORIZONTAL =
            add("grip.horizontal_edge_share", "share of horizontal edges", "horizontal", Unit.SHARE, 2, NEITHER, S1);
    /** Vertical edges (§1). */
    public static final Figure GRIP_VERTICAL =
            add("grip.vertical_edge_share", "share of vertical edges", "vertical", Unit.SHARE, 2, NEITHER, S1);
    /** Sector 0 (up) of the hand grips: added to the spec's keys. */
    public static final Figure GRIP_UP = add(
            "grip.up_share",
            "share of hand grips facing up",
            "up share",
            Unit.SHARE,
            2,
            NEITHER,
            "sector 0 of " + S1 + ", added by Variset");

    /** Hold types (§2). */
    public static final Variety HOLDS = variety("holds", "hold types", "hold-type", "hold types");
    /** Hold shapes, by hold_ref (§2). */
    public static final Variety HOLD_SHAPES = variety("hold_shapes", "hold shapes", "hold-shape", "shapes");
    /** Hold sizes (§2). */
    public static final Variety SIZES = variety("sizes", "hold sizes", "size", "sizes");
    /** Moves (§2). */
    public static final Variety MOVES = variety("moves", "moves", "move", "moves");
    /** Style tags (§2). */
    public static final Variety STYLES = variety("styles", "styles", "style", "styles");
    /** Wall-angle bands (§2). */
    public static final Variety ANGLES = variety("angles", "wall angles", "wall-angle", "angles");

    /** Wasserstein-1 distance to the target, of the main discipline (§3). */
    public static final Figure GRADES_DISTANCE = add(
            "grades.emd_to_target",
            "grades, bands from target",
            "grade dist",
            Unit.BANDS,
            2,
            LOWER,
            "Wasserstein-1 distance (Villani 2009; " + S3 + ")");
    /** Pearson's chi-square against the target (§3). */
    public static final Figure GRADES_CHI_SQUARE = add(
            "grades.chi_square",
            "grades, chi-square against target",
            "chi-square",
            Unit.NUMBER,
            2,
            LOWER,
            "Pearson 1900 goodness of fit (" + S3 + ")");
    /** Degrees of freedom of the chi-square (§3). */
    public static final Figure GRADES_CHI_SQUARE_DF =
            add("grades.chi_square_df", "grades, chi-square df", "df", Unit.COUNT, 0, NEITHER, S3);
    /** Its p-value (§3). */
    public static final Figure GRADES_CHI_SQUARE_P = add(
            "grades.chi_square_p",
            "grades, chi-square p",
            "chi-sq p",
            Unit.PROBABILITY,
            3,
            NEITHER,
            "Pearson 1900 (" + S3 + ")");
    /** Routes outside the target's bands (§3). */
    public static final Figure GRADES_OUTSIDE =
            add("grades.outside_target", "routes outside the target's bands", "outside", Unit.COUNT, 0, NEITHER, S3);
    /** A run of missing bands: the target's share in it (§3). */
    public static final Figure GAP_RUN_SHARE =
            add("grades.gap_runs.target_share", "target share of a missing range", "missing", Unit.SHARE, 2, LOWER, S3);
    /** A run of missing bands: the routes the target expects in it (§3). */
    public static final Figure GAP_RUN_ROUTES = add(
            "grades.gap_runs.expected_routes",
            "routes the target expects in a missing range",
            "expected",
            Unit.NUMBER,
            1,
            LOWER,
            S3);

    /** Spread of difficulty profiles (§4). */
    public static final Figure PROFILE_SPREAD = add(
            "profiles.split_entropy",
            "difficulty-profile spread",
            "profiles",
            Unit.NUMBER,
            2,
            HIGHER,
            "Shannon entropy of four classes / ln 4 (docs/spec/metrics.md §4)");

    /** Novelty against the look-back window (§5). */
    public static final Figure NOVELTY = add(
            "repetition.novelty",
            "novelty",
            "novelty",
            Unit.NUMBER,
            2,
            HIGHER,
            "1 − mean best Jaccard index (Jaccard 1912; " + S5 + ")");
    /** Hold reuse against the wall's last three resets (§5). */
    public static final Figure HOLD_REUSE =
            add("repetition.hold_reuse_rate", "hold reuse rate", "reuse", Unit.SHARE, 2, LOWER, S5);
    /** Routes of the look-back window compared (§5). */
    public static final Figure WINDOW_ROUTES =
            add("repetition.window_routes", "routes in the look-back window", "window", Unit.COUNT, 0, NEITHER, S5);
    /** Features two routes share (§5). */
    public static final Figure SHARED_FEATURES =
            add("repetition.shared_count", "features shared", "shared", Unit.COUNT, 0, NEITHER, S5);
    /** Features of either route (§5). */
    public static final Figure UNION_FEATURES =
            add("repetition.union_count", "features of either", "union", Unit.COUNT, 0, NEITHER, S5);
    /** The Jaccard index of a pair of routes (§5). */
    public static final Figure JACCARD =
            add("repetition.jaccard", "Jaccard index", "jaccard", Unit.NUMBER, 3, NEITHER, "Jaccard 1912 (" + S5 + ")");

    /** Hold shapes two routes share, by hold_ref (§5, the evidence of a repeat). */
    public static final Figure SHARED_SHAPES =
            add("repetition.evidence.shared_shapes", "hold shapes shared", "shapes", Unit.COUNT, 0, NEITHER, S5);
    /** Of those, the ones not set apart by their places (§5). */
    public static final Figure SHAPES_IN_PLACE = add(
            "repetition.evidence.shared_in_place",
            "hold shapes shared in the same place",
            "in place",
            Unit.COUNT,
            0,
            NEITHER,
            S5);
    /** Shared shapes placed on both routes (§5). */
    public static final Figure SHAPES_PLACED =
            add("repetition.evidence.placed", "shared shapes placed on both", "placed", Unit.COUNT, 0, NEITHER, S5);
    /** The shift between two routes' shared shapes (§5). */
    public static final Figure SHAPE_SHIFT = add(
            "repetition.evidence.shift_m", "shift between the shared shapes", "shift (m)", Unit.METRES, 2, NEITHER, S5);

    /** Routes with a full line (three hand holds or more, all placed) (§6). */
    public static final Figure LINE_ROUTES =
            add("line.routes_with_gie", "routes with a full line", "lines", Unit.COUNT, 0, NEITHER, S6);
    /** Hand holds of one route (§6). */
    public static final Figure HAND_HOLDS =
            add("line.routes.hand_holds", "hand holds", "hand holds", Unit.COUNT, 0, NEITHER, S6);
    /** Perimeter of the convex hull of one route's hand holds (§6). */
    public static final Figure HULL =
            add("line.routes.hull_perimeter", "hull of the hand holds", "hull (m)", Unit.METRES, 2, NEITHER, S6);
    /** Mean geometric index of entropy of the routes' lines (§6). */
    public static final Figure GIE_MEAN = add(
            "line.gie_mean",
            "route line wander (mean GIE)",
            "gie mean",
            Unit.NUMBER,
            3,
            NEITHER,
            "geometric index of entropy (Cordier et al. 1994), adapted to the line through the hand holds (not a "
                    + "climber's path, so not comparable with published values); "
                    + S6);
    /** Least GIE of the routes (§6). */
    public static final Figure GIE_MIN =
            add("line.gie_min", "route line wander, least", "gie min", Unit.NUMBER, 3, NEITHER, S6);
    /** Greatest GIE of the routes (§6). */
    public static final Figure GIE_MAX =
            add("line.gie_max", "route line wander, most", "gie max", Unit.NUMBER, 3, NEITHER, S6);
    /** GIE of one route (§6). */
    public static final Figure GIE =
            add("line.routes.gie", "route line wander (GIE)", "GIE", Unit.NUMBER, 3, NEITHER, S6);
    /** Path length through one route's hand holds (§6). */
    public static final Figure PATH_LENGTH =
            add("line.routes.path_length", "path through the hand holds", "path (m)", Unit.METRES, 2, NEITHER, S6);
    /** A span between two hand holds (§6). */
    public static final Figure SPAN =
            add("line.routes.move_spans", "span between hand holds", "span (m)", Unit.METRES, 2, NEITHER, S6);
    /** The climber height reach flags use (§6). */
    public static final Figure REACH_HEIGHT = add(
            "line.reach_height_m",
            "climber height for reach flags",
            "height",
            Unit.METRES,
            2,
            NEITHER,
            "common practice, no source (" + S6 + ")");
    /** The span factor reach flags use (§6). */
    public static final Figure REACH_FACTOR = add(
            "line.reach_factor",
            "span factor for reach flags",
            "factor",
            Unit.NUMBER,
            2,
            NEITHER,
            "common practice, no source (" + S6 + ")");

    /** Routes stripped in a period (trends). */
    public static final Figure STRIPPED =
            add("lifetime.stripped", "routes that came down", "stripped", Unit.COUNT, 0, NEITHER, "count");
    /** Routes up on a period's last day (trends). */
    public static final Figure STILL_UP =
            add("lifetime.still_up", "routes up at the end", "still up", Unit.COUNT, 0, NEITHER, "count");
    /** Median days up of routes stripped in a period (trends). */
    public static final Figure LIFETIME = add(
            "lifetime.median_days",
            "median days up",
            "lifetime",
            Unit.DAYS,
            1,
            NEITHER,
            "median (Hyndman and Fan 1996, type 7)");

    /** The figures an audit sets side by side (this set, the previous reset, the reference set), in order. */
    public static final List<Figure> HEADLINE = List.of(
            SCORE,
            GRIP_SECTOR_ENTROPY,
            GRIP_UP,
            GRIP_RESULTANT,
            HOLDS.hillN1(),
            HOLDS.coverage(),
            MOVES.coverage(),
            STYLES.hillN1(),
            GRADES_DISTANCE,
            NOVELTY,
            HOLD_REUSE,
            PROFILE_SPREAD,
            GIE_MEAN);

    /** The figures a trend follows month by month, and a chain compares gym by gym. */
    public static final List<Figure> TREND =
            List.of(SCORE, GRIP_SECTOR_ENTROPY, GRIP_UP, HOLDS.hillN1(), MOVES.coverage(), GRADES_DISTANCE);

    private Figures() {}

    /**
     * The variety figures of one field (§2, {@code scipy.stats.entropy} in the tests).
     *
     * @param n counted values
     * @param missing values left out for want of one
     * @param richness categories present
     * @param shannon Shannon entropy
     * @param pielou Pielou's evenness
     * @param giniSimpson Gini-Simpson index
     * @param hillN1 effective number, order 1
     * @param hillN2 effective number, order 2
     * @param coverage share of the vocabulary offered
     */
    public record Variety(
            Figure n,
            Figure missing,
            Figure richness,
            Figure shannon,
            Figure pielou,
            Figure giniSimpson,
            Figure hillN1,
            Figure hillN2,
            Figure coverage) {}

    /** The figure with a key; grade keys may name their discipline ({@code grades.rope.emd_to_target}). */
    public static Figure of(String key) {
        Figure f = ALL.get(key.replaceFirst("^grades\\.(boulder|rope)\\.", "grades."));
        if (f == null) {
            throw new IllegalArgumentException("no figure '" + key + "' in the catalogue");
        }
        return f;
    }

    /** Every figure, in the order declared. */
    public static Collection<Figure> all() {
        return Collections.unmodifiableCollection(ALL.values());
    }

    private static Variety variety(String block, String plural, String adjective, String shortNoun) {
        List<Figure> f = new ArrayList<>();
        f.add(v(block, "n", plural + " counted", "n", Unit.COUNT, 0, NEITHER, S2));
        f.add(v(block, "missing", plural + " without a value", "missing", Unit.COUNT, 0, NEITHER, S2));
        f.add(v(block, "richness", plural + ", kinds present", "kinds", Unit.COUNT, 0, HIGHER, "richness S"));
        f.add(v(block, "shannon", plural + ", Shannon entropy", "shannon", Unit.NUMBER, 2, HIGHER, "Shannon 1948"));
        f.add(v(block, "pielou", plural + ", evenness", "evenness", Unit.NUMBER, 2, HIGHER, "Pielou 1966"));
        f.add(v(block, "gini_simpson", plural + ", Gini-Simpson", "gini-simp", Unit.NUMBER, 2, HIGHER, "Simpson 1949"));
        f.add(v(block, "hill_n1", plural + ", effective number", shortNoun, Unit.NUMBER, 1, HIGHER, "Hill 1973"));
        f.add(v(block, "hill_n2", plural + ", effective number of order 2", "n2", Unit.NUMBER, 1, HIGHER, "Hill 1973"));
        f.add(v(
                block,
                "coverage",
                adjective + " coverage",
                shortFor(shortNoun),
                Unit.NUMBER,
                2,
                HIGHER,
                "N1/min(K,N)"));
        return new Variety(f.get(0), f.get(1), f.get(2), f.get(3), f.get(4), f.get(5), f.get(6), f.get(7), f.get(8));
    }

    /** One variety figure; its source names the method, then the spec's section. */
    private static Figure v(
            String block,
            String leaf,
            String label,
            String shortLabel,
            Unit unit,
            int decimals,
            Better better,
            String m) {
        return add(
                block + "." + leaf, label, shortLabel, unit, decimals, better, m.equals(S2) ? S2 : m + " (" + S2 + ")");
    }

    private static String shortFor(String noun) {
        String s = noun + " cov";
        return s.length() <= 10 ? s : noun.substring(0, 6) + " cov";
    }

    private static Figure add(
            String key, String label, String shortLabel, Unit unit, int decimals, Better better, String source) {
        Figure f = new Figure(key, label, shortLabel, unit, decimals, better, source);
        if (ALL.putIfAbsent(key, f) != null) {
            throw new IllegalStateException("the figure " + key + " is declared twice");
        }
        return f;
    }
}
