package org.variset.sample.generate;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import java.util.SplittableRandom;

/**
 * Makes one plausible route: a grade from a pyramid-shaped distribution, moves and styles that fit the wall, the
 * difficulty of each hand move, and hand and foot holds climbing up the wall with their directions and sizes. The
 * numbers are invented, chosen to look like indoor setting; nothing here is measured.
 */
final class RouteMaker {
    static final String[] BOULDER = {"VB", "V0", "V1", "V2", "V3", "V4", "V5", "V6", "V7", "V8", "V9"};
    private static final int[] BOULDER_WEIGHT = {2, 4, 6, 8, 9, 9, 7, 5, 3, 2, 1};
    private static final String[] ROPE = {"5", "5+", "6a", "6a+", "6b", "6b+", "6c", "6c+", "7a", "7a+", "7b"};
    private static final int[] ROPE_WEIGHT = {2, 4, 6, 8, 9, 8, 6, 4, 3, 2, 1};
    private static final String[] HAND = {"jug", "crimp", "edge", "sloper", "pinch", "pocket", "volume", "macro"};
    private static final int[] HAND_WEIGHT = {20, 22, 10, 14, 14, 6, 6, 8};
    private static final String[] BOULDER_MOVES = {
        "heel hook",
        "toe hook",
        "drop knee",
        "flag",
        "dyno",
        "deadpoint",
        "lock-off",
        "mantle",
        "compression",
        "gaston",
        "undercling",
        "sidepull",
        "match",
        "cross-through",
        "high step",
        "rockover",
        "smear",
        "campus",
        "kneebar",
        "bicycle",
        "coordination"
    };
    private static final String[] ROPE_MOVES = {
        "layback",
        "stem",
        "flag",
        "drop knee",
        "lock-off",
        "gaston",
        "undercling",
        "sidepull",
        "high step",
        "rockover",
        "smear",
        "heel hook",
        "deadpoint",
        "cross-through"
    };
    private static final String[] COLORS = {
        "Red", "Blue", "Green", "Yellow", "Black", "White", "Orange", "Purple", "Pink", "Teal", "Grey", "Lime"
    };

    private final SplittableRandom r;

    RouteMaker(SplittableRandom r) {
        this.r = r;
    }

    /** The label of the i-th route of a reset: a colour, then a number when colours run out. */
    static String label(int i) {
        return COLORS[i % COLORS.length] + " " + (i / COLORS.length + 1);
    }

    static String color(int i) {
        return COLORS[i % COLORS.length].toLowerCase(java.util.Locale.ROOT);
    }

    /** A grade; {@code avoid} lists grades not to set (a summer without them). */
    String grade(boolean rope, Set<String> avoid) {
        while (true) {
            String g = rope ? pick(ROPE, ROPE_WEIGHT) : pick(BOULDER, BOULDER_WEIGHT);
            if (!avoid.contains(g)) {
                return g;
            }
        }
    }

    /** One to four moves that fit the wall, with a dyno more likely on steep boulders. */
    List<String> moves(WallPlan w) {
        String[] pool = w.rope() ? ROPE_MOVES : BOULDER_MOVES;
        Set<String> out = new LinkedHashSet<>();
        int n = 1 + r.nextInt(4);
        while (out.size() < n) {
            out.add(pool[r.nextInt(pool.length)]);
        }
        return new ArrayList<>(out);
    }

    /** One or two style tags that fit the wall and the moves. */
    List<String> styles(WallPlan w, List<String> moves) {
        List<String> out = new ArrayList<>();
        if (w.rope()) {
            out.add("endurance");
        } else if (w.angleDeg() < 0) {
            out.add("balance");
        } else if (w.angleDeg() >= 40) {
            out.add("steep");
        }
        if (moves.contains("dyno") || moves.contains("coordination")) {
            out.add("coordination");
        } else if (moves.contains("compression")) {
            out.add("compression");
        }
        String[] extra = {"power", "technical", "crimpy", "slopey", "reachy", "flexibility"};
        while (out.size() < 2) {
            String s = extra[r.nextInt(extra.length)];
            if (!out.contains(s)) {
                out.add(s);
            }
        }
        return out;
    }

    /** The difficulty of each hand move: steady, sustained, one crux or several (docs/spec/metrics.md section 4). */
    List<Integer> difficulty(int handMoves, int base) {
        List<Integer> d = new ArrayList<>();
        int kind = r.nextInt(4);
        for (int i = 0; i < handMoves; i++) {
            int v = switch (kind) {
                case 0 -> base;
                case 1 -> base + r.nextInt(3) - 1;
                default -> base - 1 + r.nextInt(2);
            };
            d.add(v);
        }
        if (kind >= 2 && handMoves >= 3) {
            d.set(1 + r.nextInt(handMoves - 1), Math.min(10, base + 3 + r.nextInt(2)));
            if (kind == 3) {
                d.set(r.nextInt(handMoves), Math.min(10, base + 3));
            }
        }
        d.replaceAll(v -> Math.max(1, Math.min(10, v)));
        return d;
    }

    /**
     * Hand holds climbing up the wall, then foot holds.
     *
     * @param shapes where hold shapes come from (a wall's inventory)
     * @param upCrimps the share of hand holds that are up-facing crimps (a setter's habit; 0 for none)
     * @param longReach whether one move is a long reach (a dyno)
     */
    List<GeneratedRoute.Hold> holds(WallPlan w, HoldShapes shapes, double upCrimps, boolean longReach) {
        int hand = w.rope() ? 12 + r.nextInt(7) : 6 + r.nextInt(5);
        int feet = w.rope() ? 4 + r.nextInt(5) : 3 + r.nextInt(4);
        List<GeneratedRoute.Hold> out = new ArrayList<>();
        double x = 0.6 + r.nextDouble() * (w.widthM() - 1.2);
        double y = 0.7 + r.nextDouble() * 0.6;
        double step = (w.heightM() - 0.6 - y) / hand;
        int reach = longReach ? 1 + r.nextInt(Math.max(1, hand - 2)) : -1;
        for (int i = 0; i < hand; i++) {
            String role = i == 0 ? "start" : i == hand - 1 ? "finish" : "hand";
            HoldShapes.Shape s =
                    r.nextDouble() < upCrimps ? shapes.upCrimp(r) : shapes.hand(r, pick(HAND, HAND_WEIGHT));
            out.add(new GeneratedRoute.Hold(i + 1, role, s.type(), s.size(), s.grips(), s.ref(), round(x), round(y)));
            double dy = i + 1 == reach ? 1.7 + r.nextDouble() * 0.25 : step * (0.6 + r.nextDouble() * 0.8);
            y = Math.min(w.heightM() - 0.3, y + dy);
            x = Math.max(0.3, Math.min(w.widthM() - 0.3, x + (r.nextDouble() - 0.5) * 1.1));
        }
        for (int i = 0; i < feet; i++) {
            HoldShapes.Shape s = shapes.foot(r);
            GeneratedRoute.Hold h = out.get(r.nextInt(hand));
            out.add(new GeneratedRoute.Hold(
                    0,
                    "foot",
                    s.type(),
                    s.size(),
                    List.of(),
                    s.ref(),
                    round(Math.max(0.2, Math.min(w.widthM() - 0.2, h.x() + (r.nextDouble() - 0.5) * 0.8))),
                    round(Math.max(0.15, h.y() - 0.9))));
        }
        return out;
    }

    private String pick(String[] values, int[] weights) {
        int total = 0;
        for (int w : weights) {
            total += w;
        }
        int k = r.nextInt(total);
        for (int i = 0; i < values.length; i++) {
            k -= weights[i];
            if (k < 0) {
                return values[i];
            }
        }
        return values[values.length - 1];
    }

    private static double round(double v) {
        return Math.round(v * 100) / 100.0;
    }
}
