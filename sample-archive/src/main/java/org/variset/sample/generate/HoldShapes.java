package org.variset.sample.generate;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;

/**
 * Where a wall's holds come from. Most walls draw from the gym's large inventory and turn each shape as the route
 * needs; a wall can instead keep to a small fixed set of shapes, each always turned the same way (the planted story
 * of a wall whose resets keep reusing the same holds).
 */
final class HoldShapes {
    /**
     * A shape as placed.
     *
     * @param ref its inventory label
     * @param type its hold type
     * @param size its size
     * @param grips its directions in degrees
     */
    record Shape(String ref, String type, String size, List<Integer> grips) {}

    private final String prefix;
    private final List<Shape> fixed;

    private HoldShapes(String prefix, List<Shape> fixed) {
        this.prefix = prefix;
        this.fixed = fixed;
    }

    /** The gym's large inventory, shapes turned freely. */
    static HoldShapes inventory(String prefix) {
        return new HoldShapes(prefix, null);
    }

    /** A small fixed set of shapes, each always turned the same way. */
    static HoldShapes fixedSet(String prefix, int count, SplittableRandom r) {
        HoldShapes any = inventory(prefix);
        String[] types = {"jug", "crimp", "edge", "sloper", "pinch", "pocket", "macro"};
        List<Shape> out = new ArrayList<>();
        for (int i = 1; i <= count; i++) {
            String type = types[r.nextInt(types.length)];
            out.add(new Shape(
                    String.format(java.util.Locale.ROOT, "%s-%02d", prefix, i),
                    type,
                    any.size(type, r),
                    any.grips(type, r)));
        }
        return new HoldShapes(prefix, out);
    }

    /** A hand hold of a type (from a fixed set: any of its shapes). */
    Shape hand(SplittableRandom r, String type) {
        if (fixed != null) {
            return fixed.get(r.nextInt(fixed.size()));
        }
        return new Shape(ref(type, r), type, size(type, r), grips(type, r));
    }

    /** A crimp facing up, within 20 degrees. */
    Shape upCrimp(SplittableRandom r) {
        int g = (360 + r.nextInt(41) - 20) % 360;
        return new Shape(ref("crimp", r), "crimp", r.nextBoolean() ? "xs" : "s", List.of(g));
    }

    /** A foot hold. */
    Shape foot(SplittableRandom r) {
        String type = r.nextInt(10) < 7 ? "foot-chip" : "jib";
        return new Shape(ref(type, r), type, "xs", List.of());
    }

    private String ref(String type, SplittableRandom r) {
        return String.format(
                java.util.Locale.ROOT, "%s%c%d", prefix, Character.toUpperCase(type.charAt(0)), 1 + r.nextInt(400));
    }

    private String size(String type, SplittableRandom r) {
        String[] sizes = switch (type) {
            case "jug" -> new String[] {"m", "l", "xl"};
            case "crimp" -> new String[] {"xs", "s"};
            case "edge", "pocket" -> new String[] {"s", "m"};
            case "sloper" -> new String[] {"m", "l", "xl"};
            case "pinch" -> new String[] {"s", "m", "l"};
            case "volume" -> new String[] {"xl"};
            default -> new String[] {"l", "xl"};
        };
        return sizes[r.nextInt(sizes.length)];
    }

    /** Directions that fit a type: mostly up, some side-pulls and underclings, pinches both ways, volumes none. */
    private List<Integer> grips(String type, SplittableRandom r) {
        int roll = r.nextInt(100);
        return switch (type) {
            case "pinch" -> List.of(90 + r.nextInt(21) - 10, 270 + r.nextInt(21) - 10);
            case "volume" -> roll < 70 ? List.of() : List.of(r.nextInt(8) * 45);
            case "macro" -> List.of(r.nextInt(72) * 5);
            default ->
                roll < 62
                        ? List.of((360 + r.nextInt(61) - 30) % 360)
                        : roll < 84
                                ? List.of(r.nextBoolean() ? 90 + r.nextInt(31) - 15 : 270 + r.nextInt(31) - 15)
                                : roll < 94 ? List.of(180 + r.nextInt(41) - 20) : List.of(r.nextInt(8) * 45);
        };
    }
}
