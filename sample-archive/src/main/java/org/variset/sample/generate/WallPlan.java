package org.variset.sample.generate;

import java.util.List;

/**
 * One wall of a generated gym.
 *
 * @param name its name
 * @param rope true for a rope wall, false for boulders
 * @param angleDeg its angle from vertical (negative: slab)
 * @param heightM its height
 * @param widthM its width
 * @param cycleDays how often it is reset
 * @param routesPerReset how many routes a reset brings (lowest, highest)
 */
record WallPlan(
        String name,
        boolean rope,
        double angleDeg,
        double heightM,
        double widthM,
        int cycleDays,
        int[] routesPerReset) {

    /** The walls every generated gym has: five boulder walls and two rope walls. */
    static List<WallPlan> standard() {
        return List.of(
                new WallPlan("Cave", false, 40, 4.5, 9, 28, new int[] {10, 13}),
                new WallPlan("Prow", false, 25, 4.5, 7, 28, new int[] {8, 11}),
                new WallPlan("Slab", false, -10, 4.2, 7, 28, new int[] {8, 10}),
                new WallPlan("Roof", false, 60, 4.0, 6, 28, new int[] {7, 10}),
                new WallPlan("Wave", false, 15, 4.5, 10, 28, new int[] {10, 13}),
                new WallPlan("Tower", true, 5, 14, 9, 56, new int[] {6, 8}),
                new WallPlan("Headwall", true, 20, 15, 8, 56, new int[] {6, 8}));
    }
}
