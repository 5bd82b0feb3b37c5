package org.variset.reports.scoring.repetition;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.math.BigDecimal;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.variset.archive.settings.GymSettings;

class RepetitionTest {
    private static RouteFeatures route(String id, List<String> moves, RouteFeatures.HandHold... holds) {
        return RouteFeatures.of(id, List.of(holds), moves, "2", "V3");
    }

    private static RouteFeatures.HandHold hold(String type, Integer... sectors) {
        return new RouteFeatures.HandHold(type, List.of(sectors));
    }

    @Test
    void buildsTheNamespacedFeaturesOfTheSpec() {
        RouteFeatures f =
                route("Blue 7", List.of("heel hook", "dyno"), hold("crimp", 0), hold("pinch", 2, 6), hold("volume"));
        assertThat(f.features())
                .containsExactlyInAnyOrder(
                        "hold:crimp@0",
                        "hold:pinch@90",
                        "hold:pinch@270",
                        "hold:volume@none",
                        "move:heel hook",
                        "move:dyno",
                        "pair:heel hook>dyno",
                        "angle:2",
                        "grade:V3");
        assertThat(f.detail()).isEqualTo(6);
    }

    /**
     * Jaccard (1912): |A ∩ B| / |A ∪ B|. Worked by hand: two routes sharing 6 of 10 features give 0.6, which the
     * default threshold 0.6 counts as a near-repeat in exact arithmetic (0.6 as a double is not exactly 3/5).
     */
    @Test
    void comparesTheThresholdExactly() {
        RouteFeatures a = RouteFeatures.of(
                "a",
                List.of(hold("crimp", 0), hold("jug", 0), hold("pinch", 2), hold("sloper", 4)),
                List.of(),
                "2",
                "V3");
        RouteFeatures b = RouteFeatures.of(
                "b",
                List.of(
                        hold("crimp", 0),
                        hold("jug", 0),
                        hold("pinch", 2),
                        hold("edge", 4),
                        hold("pocket", 1),
                        hold("macro", 5)),
                List.of(),
                "2",
                "V3");
        Similarity s = Similarity.of(a, b);
        assertThat(s.shared()).isEqualTo(5);
        assertThat(s.union()).isEqualTo(9);
        RouteFeatures c = RouteFeatures.of(
                "c",
                List.of(
                        hold("crimp", 0),
                        hold("jug", 0),
                        hold("pinch", 2),
                        hold("sloper", 4),
                        hold("edge", 4),
                        hold("pocket", 1)),
                List.of(),
                "2",
                "V3");
        RouteFeatures d = RouteFeatures.of(
                "d",
                List.of(
                        hold("crimp", 0),
                        hold("jug", 0),
                        hold("pinch", 2),
                        hold("sloper", 4),
                        hold("macro", 5),
                        hold("volume", 7)),
                List.of(),
                "9",
                "V9");
        Similarity cd = Similarity.of(c, d);
        assertThat(cd.shared()).isEqualTo(4);
        assertThat(cd.union()).isEqualTo(12);
        Similarity six = new Similarity(6, 10, Set.of());
        assertThat(six.atLeast(GymSettings.DEFAULT_THRESHOLD)).isTrue();
        assertThat(new Similarity(5, 9, Set.of()).atLeast(GymSettings.DEFAULT_THRESHOLD))
                .isFalse();
    }

    @Test
    void saysNotEnoughDetailInsteadOfAnIndex() {
        RouteFeatures thin = route("thin", List.of("dyno"), hold("jug", 0));
        RouteFeatures rich = route("rich", List.of("dyno", "match"), hold("jug", 0), hold("crimp", 2));
        assertThat(Similarity.of(thin, rich)).isNull();
        RepetitionFigures r = Repetition.of(List.of(thin), List.of(rich), GymSettings.DEFAULT_THRESHOLD);
        assertThat(r.notEnoughDetail()).containsExactly("thin");
        assertThat(r.novelty()).isNull();
    }

    @Test
    void findsRepeatsAgainstTheWindowAndInsideTheReset() {
        RouteFeatures earlier = route("Blue 3", List.of("heel hook", "dyno"), hold("crimp", 0), hold("pinch", 2));
        RouteFeatures again = route("Blue 7", List.of("heel hook", "dyno"), hold("crimp", 0), hold("pinch", 2));
        RouteFeatures twin = route("Red 2", List.of("heel hook", "dyno"), hold("crimp", 0), hold("pinch", 2));
        RepetitionFigures r = Repetition.of(List.of(again, twin), List.of(earlier), GymSettings.DEFAULT_THRESHOLD);
        assertThat(r.nearRepeats()).hasSize(2);
        assertThat(r.nearRepeats().get(0).similarity().sharedFeatures()).contains("pair:heel hook>dyno");
        assertThat(r.internalRepeats())
                .singleElement()
                .satisfies(p -> assertThat(p.other()).isEqualTo("Red 2"));
        assertThat(r.novelty()).isCloseTo(0.0, within(1e-12));
        assertThat(Repetition.of(List.of(again), List.of(), GymSettings.DEFAULT_THRESHOLD)
                        .novelty())
                .isEqualTo(1.0);
    }

    @Test
    void comparesOnlyRoutesOfTheSameGroup() {
        RouteFeatures boulder = RouteFeatures.of(
                "b", "boulder", List.of(hold("crimp", 0), hold("pinch", 2)), List.of("heel hook", "dyno"), "2", "V3");
        RouteFeatures rope = RouteFeatures.of(
                "r", "rope", List.of(hold("crimp", 0), hold("pinch", 2)), List.of("heel hook", "dyno"), "2", "V3");
        assertThat(Similarity.of(boulder, rope)).isNull();
        RepetitionFigures r = Repetition.of(List.of(boulder), List.of(rope), GymSettings.DEFAULT_THRESHOLD);
        assertThat(r.nearRepeats()).isEmpty();
        assertThat(r.novelty()).isEqualTo(1.0);
    }

    @Test
    void measuresHoldReuse() {
        assertThat(Repetition.holdReuseRate(
                        List.of(Set.of("J12@0"), Set.of("P7@2", "P7@6"), Set.of()), Set.of("J12@0", "P7@6")))
                .isCloseTo(2 / 3.0, within(1e-12));
        assertThat(Repetition.holdReuseRate(List.of(), Set.of())).isNull();
    }

    /**
     * The threshold test is exact: for every shared ≤ union ≤ 150 and decimal thresholds, {@code atLeast} agrees with
     * integer cross-multiplication shared × 10^k ≥ t × union (t × 10^-k the threshold). Common practice: comparing
     * fractions by cross-multiplying integers.
     */
    @Test
    void comparesEveryFractionWithTheThresholdExactly() {
        for (String t : List.of("0.6", "0.7", "0.35", "0.55", "0.9", "0.123")) {
            BigDecimal threshold = new BigDecimal(t);
            long scale = BigDecimal.TEN.pow(threshold.scale()).longValueExact();
            long numerator = threshold.unscaledValue().longValueExact();
            for (int union = 1; union <= 150; union++) {
                for (int shared = 0; shared <= union; shared++) {
                    boolean expected = shared * scale >= numerator * union;
                    assertThat(new Similarity(shared, union, Set.of()).atLeast(threshold))
                            .as("%d/%d >= %s", shared, union, t)
                            .isEqualTo(expected);
                }
            }
        }
    }
}
