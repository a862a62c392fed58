package org.congener.core.fusion;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Arrays;
import java.util.SplittableRandom;
import java.util.function.IntPredicate;
import org.junit.jupiter.api.Test;

class TopNSelectionTest {

    /**
     * The selection by sorting, as the rule reads: the eligible items that are neither −∞ nor NaN, by
     * score descending, ties to the smaller index, the first n.
     */
    private static int[] bySorting(double[] fused, int n, IntPredicate eligible) {
        return java.util.stream.IntStream.range(0, fused.length)
                .filter(i -> fused[i] != Double.NEGATIVE_INFINITY && !Double.isNaN(fused[i]) && eligible.test(i))
                .boxed()
                .sorted((a, b) -> fused[a] != fused[b] ? Double.compare(fused[b], fused[a]) : Integer.compare(a, b))
                .limit(n)
                .mapToInt(Integer::intValue)
                .toArray();
    }

    @Test
    void shouldListTheSameItemsAsSortingWhenScoresTieAndHoldNaNsAndInfinities() {
        SplittableRandom random = new SplittableRandom(23);
        for (int round = 0; round < 3000; round++) {
            int items = random.nextInt(300);
            double[] fused = new double[items];
            for (int i = 0; i < items; i++) {
                int pick = random.nextInt(20);
                fused[i] = pick == 0 ? Double.NEGATIVE_INFINITY
                        : pick == 1 ? Double.NaN
                        : pick == 2 ? Double.POSITIVE_INFINITY
                        // few distinct values in some rounds, so ties decide many places
                        : round % 2 == 0 ? random.nextInt(5) : random.nextGaussian();
            }
            int n = 1 + random.nextInt(30);
            boolean[] allowed = new boolean[items];
            for (int i = 0; i < items; i++) {
                allowed[i] = random.nextInt(4) != 0;
            }
            IntPredicate eligible = i -> allowed[i];
            assertArrayEquals(bySorting(fused, n, eligible), OneResearcherScoring.topN(fused, n, eligible),
                    "round " + round + ", " + items + " items, n " + n + ": " + Arrays.toString(fused));
        }
    }

    @Test
    void shouldAskTheFilterOnlyAboutItemsThatWouldEnterTheListOnceItIsFull() {
        // scores fall with the index: once the first five fill the list, no later item is above its last
        double[] fused = new double[1000];
        for (int i = 0; i < fused.length; i++) {
            fused[i] = -i;
        }
        int[] asked = new int[1];
        int[] top = OneResearcherScoring.topN(fused, 5, i -> {
            asked[0]++;
            return true;
        });
        assertArrayEquals(new int[] {0, 1, 2, 3, 4}, top);
        assertEquals(5, asked[0], "the filter is asked about the five listed items only");
    }
}
