package org.variset.reports.scoring.repetition;

import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;

/**
 * The feature set of one route (docs/spec/metrics.md section 5): {@code hold:<type>@<sector>} for each grip of each
 * hand-role placement ({@code hold:<type>@none} without a direction), {@code move:<descriptor>} for each move,
 * {@code pair:<a>><b>} for each consecutive pair of moves, {@code angle:<band>} and {@code grade:<band>}. A sector
 * is written as the direction of its centre in degrees ({@code crimp@0}, {@code pinch@90}), the notation search
 * uses too, so that a setter reads the feature without a sector table.
 *
 * @param id what names the route in reports
 * @param group routes are compared only within one group (the discipline: boulders with boulders)
 * @param features the features
 * @param detail how many distinct hold and move features it has (fewer than 4: too little detail to compare)
 * @param evidence what decides whether a similar route is a repeat ({@link RepeatEvidence})
 */
public record RouteFeatures(String id, String group, Set<String> features, int detail, RouteEvidence evidence) {

    /** Routes with fewer hold and move features than this are not compared (docs/spec/metrics.md). */
    public static final int MIN_DETAIL = 4;

    /**
     * One hand-role placement's part of the features.
     *
     * @param type the hold type
     * @param sectors the grip sectors 0..7 of its directions (docs/spec/metrics.md section 1); empty for none
     */
    public record HandHold(String type, List<Integer> sectors) {}

    /** The features of a route in the default group. */
    public static RouteFeatures of(
            String id, List<HandHold> handHolds, List<String> moves, String angleBand, String gradeBand) {
        return of(id, "", handHolds, moves, angleBand, gradeBand);
    }

    /** The features of a route, with only its moves and grade band as evidence. */
    public static RouteFeatures of(
            String id, String group, List<HandHold> handHolds, List<String> moves, String angleBand, String gradeBand) {
        return of(
                id, group, handHolds, moves, angleBand, gradeBand, new RouteEvidence("", gradeBand, moves, List.of()));
    }

    /** The features of a route with the evidence that tells a repeat. */
    public static RouteFeatures of(
            String id,
            String group,
            List<HandHold> handHolds,
            List<String> moves,
            String angleBand,
            String gradeBand,
            RouteEvidence evidence) {
        Set<String> f = new LinkedHashSet<>();
        for (HandHold h : handHolds) {
            if (h.sectors().isEmpty()) {
                f.add("hold:" + h.type() + "@none");
            }
            h.sectors().forEach(s -> f.add("hold:" + h.type() + "@" + sectorDegrees(s)));
        }
        moves.forEach(m -> f.add("move:" + m));
        for (int i = 1; i < moves.size(); i++) {
            f.add("pair:" + moves.get(i - 1) + ">" + moves.get(i));
        }
        int detail = (int) f.stream()
                .filter(x -> x.startsWith("hold:") || x.startsWith("move:"))
                .count();
        if (angleBand != null) {
            f.add("angle:" + angleBand);
        }
        if (gradeBand != null) {
            f.add("grade:" + gradeBand);
        }
        return new RouteFeatures(id, group, Set.copyOf(f), detail, evidence);
    }

    /** The direction of a sector's centre in degrees: sector k faces 45k degrees. */
    public static int sectorDegrees(int sector) {
        if (sector < 0 || sector > 7) {
            throw new IllegalArgumentException("sector " + sector + " is outside 0..7");
        }
        return 45 * sector;
    }

    /** True when the route has enough detail to be compared. */
    public boolean comparable() {
        return detail >= MIN_DETAIL;
    }
}
