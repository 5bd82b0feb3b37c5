package org.variset.reports.plan;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Random;
import java.util.stream.LongStream;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

class GradeSlotPlannerTest {

    /** Every way to put n slots into k bands (compositions), for brute force. */
    private static List<int[]> compositions(int n, int k) {
        List<int[]> out = new ArrayList<>();
        fill(new int[k], 0, n, out);
        return out;
    }

    private static void fill(int[] x, int b, int left, List<int[]> out) {
        if (b == x.length - 1) {
            x[b] = left;
            out.add(x.clone());
            return;
        }
        for (int v = 0; v <= left; v++) {
            x[b] = v;
            fill(x, b + 1, left - v, out);
        }
    }

    /**
     * On seeded random small cases the planner's distance equals the least distance over every composition of n
     * into the bands (brute force over the definition of docs/spec/metrics.md section 3), and no move of one slot from one
     * band to another lowers it.
     */
    @ParameterizedTest(name = "seed {0}")
    @MethodSource("seeds")
    void matchesBruteForceAndNoSingleMoveImprovesIt(long seed) {
        Random r = new Random(seed);
        int k = 2 + r.nextInt(5);
        int n = 1 + r.nextInt(7);
        long[] rest = LongStream.range(0, k).map(i -> r.nextInt(6)).toArray();
        double[] target = new double[k];
        for (int i = 0; i < k; i++) {
            target[i] = r.nextInt(4) == 0 ? 0 : 1 + r.nextInt(6);
        }
        target[r.nextInt(k)] += 1;
        long[] previous = LongStream.range(0, k).map(i -> r.nextInt(3)).toArray();
        GradeSlotPlanner.Result plan = GradeSlotPlanner.plan(rest, target, n, previous);
        assertThat(Arrays.stream(plan.slots()).sum()).isEqualTo(n);
        double best = compositions(n, k).stream()
                .mapToDouble(x -> GradeSlotPlanner.distance(rest, x, target))
                .min()
                .orElseThrow();
        assertThat(plan.distanceAfter()).isCloseTo(best, within(1e-12));
        assertThat(GradeSlotPlanner.distance(rest, plan.slots(), target)).isCloseTo(best, within(1e-12));
        for (int from = 0; from < k; from++) {
            for (int to = 0; to < k; to++) {
                if (from == to || plan.slots()[from] == 0) {
                    continue;
                }
                int[] moved = plan.slots().clone();
                moved[from]--;
                moved[to]++;
                assertThat(GradeSlotPlanner.distance(rest, moved, target))
                        .isGreaterThanOrEqualTo(plan.distanceAfter() - 1e-12);
            }
        }
    }

    static Stream<Long> seeds() {
        return LongStream.rangeClosed(1, 60).boxed();
    }

    /**
     * Worked by hand (checked with Python's exact fractions by enumerating every composition): bands A to D with
     * target 1:1:1:1, the rest of the gym 2 A and 2 B, two slots. Both (0, 0, 0, 2) and (0, 0, 1, 1) give distance
     * 1/12 + 1/6 + 1/12 = 1/3, the least; the tie goes to the wall's previous mix (all D, or all C).
     */
    @Test
    void breaksTiesTowardsThePreviousMix() {
        long[] rest = {2, 2, 0, 0};
        double[] target = {1, 1, 1, 1};
        GradeSlotPlanner.Result towardsD = GradeSlotPlanner.plan(rest, target, 2, new long[] {0, 0, 0, 3});
        assertThat(towardsD.distanceAfter()).isCloseTo(1 / 3.0, within(1e-12));
        assertThat(towardsD.slots()).containsExactly(0, 0, 0, 2);
        GradeSlotPlanner.Result towardsC = GradeSlotPlanner.plan(rest, target, 2, new long[] {0, 0, 3, 0});
        assertThat(towardsC.distanceAfter()).isCloseTo(1 / 3.0, within(1e-12));
        assertThat(towardsC.slots()).containsExactly(0, 0, 1, 1);
    }

    /** Worked by hand: with rest 2, 2, 0 and target 1:1:1, three slots go 0, 1, 2 (distance 1/21 + 1/21 = 2/21). */
    @Test
    void fillsTheEmptyBand() {
        GradeSlotPlanner.Result r = GradeSlotPlanner.plan(new long[] {2, 2, 0}, new double[] {1, 1, 1}, 3, new long[3]);
        assertThat(r.slots()).containsExactly(0, 1, 2);
        assertThat(r.distanceAfter()).isCloseTo(2 / 21.0, within(1e-12));
    }

    @Test
    void refusesNoSlotsAndATargetWithoutShares() {
        assertThatThrownBy(() -> GradeSlotPlanner.plan(new long[] {1}, new double[] {1}, 0, new long[] {0}))
                .isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> GradeSlotPlanner.plan(new long[] {1, 1}, new double[] {0, 0}, 2, new long[2]))
                .hasMessageContaining("no positive share");
    }
}
