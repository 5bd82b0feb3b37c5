package org.variset.sample.generate;

import java.util.List;

/**
 * A generated route before it is written.
 *
 * @param label its label ({@code Red 1})
 * @param grade its grade as written
 * @param setters its setters
 * @param color its tape colour
 * @param moves its notable moves in order
 * @param styles its style tags
 * @param difficulty the difficulty of each hand move
 * @param holds its hold placements, hand holds in climbing order first
 */
record GeneratedRoute(
        String label,
        String grade,
        List<String> setters,
        String color,
        List<String> moves,
        List<String> styles,
        List<Integer> difficulty,
        List<Hold> holds) {

    /**
     * One generated placement.
     *
     * @param seq order along the route, or 0 for a foot hold (left empty)
     * @param role hand, start, finish or foot
     * @param type the hold type
     * @param size its size
     * @param grips its directions in degrees; empty for none
     * @param ref its shape's inventory label
     * @param x metres from the left
     * @param y metres up
     */
    record Hold(int seq, String role, String type, String size, List<Integer> grips, String ref, double x, double y) {}
}
