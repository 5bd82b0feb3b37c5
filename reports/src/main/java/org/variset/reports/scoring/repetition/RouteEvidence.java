package org.variset.reports.scoring.repetition;

import java.util.List;

/**
 * What a setter looks at to tell a repeat from a look-alike, beyond the feature set: the physical hold shapes of the
 * hand holds (by {@code hold_ref}) and where they are, the sequence of moves, the grade band and the wall.
 *
 * @param wall the wall, or empty when unknown
 * @param gradeBand the grade band, or null
 * @param moves the moves in climbing order
 * @param shapes the hand-role placements that name their hold shape, in sequence order
 */
public record RouteEvidence(String wall, String gradeBand, List<String> moves, List<Shape> shapes) {

    /** Nothing beyond the features: no shapes, no moves, no band. */
    public static final RouteEvidence NONE = new RouteEvidence("", null, List.of(), List.of());

    /**
     * One hand hold's shape and place.
     *
     * @param ref its {@code hold_ref}
     * @param x metres from the wall's left edge, or null
     * @param y metres from the wall's bottom edge, or null
     */
    public record Shape(String ref, Double x, Double y) {
        /** True when the hold has a position. */
        public boolean placed() {
            return x != null && y != null;
        }
    }

    /** Copies the lists. */
    public RouteEvidence {
        wall = wall == null ? "" : wall;
        moves = List.copyOf(moves);
        shapes = List.copyOf(shapes);
    }
}
