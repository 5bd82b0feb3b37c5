package org.variset.reports.scoring.repetition;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.variset.archive.settings.GymSettings;

/**
 * Near-repeats as a setter judges them, on planted cases: an earlier problem, three real repeats of it and four
 * look-alikes that share its hold types, directions and moves (so its feature Jaccard index alone would call them
 * repeats). The routes, shapes and numbers are invented; the verdicts are what a setter would say of each story.
 */
class RepeatEvidenceTest {
    private static final List<String> SEQUENCE = List.of("heel hook", "dyno", "match");

    /** A hand hold: its type, its grip sector, and optionally its shape and place. */
    private record Hold(String type, int sector, String ref, Double x, Double y) {}

    private static Hold h(String type, int sector, String ref, double x, double y) {
        return new Hold(type, sector, ref, x, y);
    }

    private static RouteFeatures route(String id, String band, List<String> moves, List<Hold> holds) {
        List<RouteFeatures.HandHold> hand = new ArrayList<>();
        List<RouteEvidence.Shape> shapes = new ArrayList<>();
        for (Hold x : holds) {
            hand.add(new RouteFeatures.HandHold(x.type(), List.of(x.sector())));
            if (x.ref() != null) {
                shapes.add(new RouteEvidence.Shape(x.ref(), x.x(), x.y()));
            }
        }
        return RouteFeatures.of(id, "boulder", hand, moves, "2", band, new RouteEvidence("Cave", band, moves, shapes));
    }

    /** The earlier problem: five hand holds with shapes and places, heel hook > dyno > match, band V4. */
    private static List<Hold> earlierHolds(double dx, double noise) {
        return List.of(
                h("jug", 0, "J1", 1.0 + dx, 1.0),
                h("pinch", 2, "P2", 1.5 + dx + noise, 1.8),
                h("crimp", 0, "C3", 2.0 + dx, 2.5 - noise),
                h("sloper", 4, "S4", 2.2 + dx, 3.2),
                h("jug", 0, "J5", 2.5 + dx - noise, 4.0));
    }

    private static List<Hold> withoutShapes(List<Hold> holds) {
        return holds.stream()
                .map(x -> new Hold(x.type(), x.sector(), null, null, null))
                .toList();
    }

    private static final RouteFeatures EARLIER = route("Red 1", "V4", SEQUENCE, earlierHolds(0, 0));

    /** Each planted reset route, and whether a setter calls it a repeat of Red 1. */
    private static final List<RouteFeatures> REAL = List.of(
            route("Green 1 (the same, set 0.6 m to the right)", "V4", SEQUENCE, earlierHolds(0.6, 0.05)),
            route("Green 2 (the same, graded a band harder)", "V5", SEQUENCE, earlierHolds(0, 0.03)),
            route(
                    "Green 3 (no shapes recorded, same band and sequence)",
                    "V4",
                    SEQUENCE,
                    withoutShapes(earlierHolds(0, 0))));

    private static final List<RouteFeatures> LOOK_ALIKES = List.of(
            route(
                    "Black 1 (other shapes of the same types, a 7b beside a 6a+)",
                    "V8",
                    SEQUENCE,
                    List.of(
                            h("jug", 0, "X1", 3.0, 1.0),
                            h("pinch", 2, "X2", 3.4, 2.0),
                            h("crimp", 0, "X3", 3.9, 2.6),
                            h("sloper", 4, "X4", 4.3, 3.3),
                            h("jug", 0, "X5", 4.6, 4.1))),
            route(
                    "Black 2 (no shapes recorded, another grade band)",
                    "V8",
                    SEQUENCE,
                    withoutShapes(earlierHolds(0, 0))),
            route(
                    "Black 3 (the same shapes, scattered across the wall)",
                    "V4",
                    SEQUENCE,
                    List.of(
                            h("jug", 0, "J1", 5.0, 3.0),
                            h("pinch", 2, "P2", 1.0, 4.0),
                            h("crimp", 0, "C3", 3.5, 0.8),
                            h("sloper", 4, "S4", 0.6, 1.6),
                            h("jug", 0, "J5", 4.2, 2.2))),
            route(
                    "Black 4 (no shapes recorded, the moves in another order)",
                    "V4",
                    List.of("match", "dyno", "heel hook"),
                    withoutShapes(earlierHolds(0, 0))));

    private static Set<String> flaggedByJaccardAlone(List<RouteFeatures> routes) {
        return routes.stream()
                .filter(r -> Similarity.of(r, EARLIER).atLeast(GymSettings.DEFAULT_THRESHOLD))
                .map(RouteFeatures::id)
                .collect(Collectors.toSet());
    }

    @Test
    void findsEveryPlantedRepeatAndNoLookAlikeWhereTheJaccardIndexAloneCalledThemAll() {
        List<RouteFeatures> reset = new ArrayList<>(REAL);
        reset.addAll(LOOK_ALIKES);
        RepetitionFigures r = Repetition.of(reset, List.of(EARLIER), GymSettings.DEFAULT_THRESHOLD);
        Set<String> found =
                r.nearRepeats().stream().map(RepetitionFigures.Pair::route).collect(Collectors.toSet());
        Set<String> falseAlarms = found.stream()
                .filter(id -> LOOK_ALIKES.stream().anyMatch(l -> l.id().equals(id)))
                .collect(Collectors.toSet());
        // Before: the spec's Jaccard threshold alone calls every planted look-alike a repeat.
        assertThat(flaggedByJaccardAlone(LOOK_ALIKES)).hasSize(LOOK_ALIKES.size());
        assertThat(flaggedByJaccardAlone(REAL)).hasSize(REAL.size());
        // After: the real repeats, and none of the look-alikes, which are set aside.
        assertThat(found)
                .containsExactlyInAnyOrderElementsOf(
                        REAL.stream().map(RouteFeatures::id).toList());
        assertThat(r.nearRepeats()).allSatisfy(p -> assertThat(p.other()).isEqualTo(EARLIER.id()));
        assertThat(r.setAside().stream().filter(p -> p.other().equals(EARLIER.id())))
                .extracting(RepetitionFigures.Pair::route)
                .containsExactlyInAnyOrderElementsOf(
                        LOOK_ALIKES.stream().map(RouteFeatures::id).toList());
        System.out.printf(
                "RepeatEvidenceTest: real repeats found %d of %d (Jaccard alone %d); false alarms %d of %d look-alikes "
                        + "(Jaccard alone %d)%n",
                found.size(),
                REAL.size(),
                flaggedByJaccardAlone(REAL).size(),
                falseAlarms.size(),
                LOOK_ALIKES.size(),
                flaggedByJaccardAlone(LOOK_ALIKES).size());
    }

    @Nested
    class InWords {
        @Test
        void saysHowManyShapesMatchAndTheShift() {
            RepeatEvidence e = RepeatEvidence.of(EARLIER.evidence(), REAL.get(0).evidence());
            assertThat(e.isRepeat()).isTrue();
            assertThat(e.words())
                    .isEqualTo("same 5 of 5 hold shapes within 20 cm once shifted 0.6 m, same moves heel hook > dyno > "
                            + "match, same grade band V4, same wall");
        }

        @Test
        void saysWhenNoShapesWereRecorded() {
            RepeatEvidence e = RepeatEvidence.of(EARLIER.evidence(), REAL.get(2).evidence());
            assertThat(e.words()).endsWith("no hold shapes recorded to compare");
        }

        @Test
        void findsTheLongestRunOfMovesInOrder() {
            assertThat(RepeatEvidence.longestCommonRun(
                            List.of("mantle", "heel hook", "dyno", "match"), List.of("heel hook", "dyno", "toe hook")))
                    .containsExactly("heel hook", "dyno");
            assertThat(RepeatEvidence.longestCommonRun(List.of("dyno"), List.of("match")))
                    .isEmpty();
        }
    }
}
