package org.congener.core.fusion;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;

import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/** The radix order of reciprocal rank fusion against the boxed comparator sort it replaces. */
class RankOrderTest {
    private static final double[] SPECIAL = {0.0, -0.0, Double.NaN, Double.POSITIVE_INFINITY,
        Double.NEGATIVE_INFINITY, Double.MIN_VALUE, -Double.MIN_VALUE, Double.MAX_VALUE, -Double.MAX_VALUE, 1.0, -1.0};

    @Test
    void shouldRankAsTheBoxedSortWhenScoresTieAndIncludeSignedZerosNansAndInfinities() {
        SplittableRandom random = new SplittableRandom(31);
        for (int n : new int[] {0, 1, 2, 3, 17, 256, 1000}) {
            RankOrder order = new RankOrder(n);
            for (int round = 0; round < 5; round++) {
                double[] v = new double[n];
                for (int i = 0; i < n; i++) {
                    int kind = random.nextInt(4);
                    v[i] = switch (kind) {
                        case 0 -> SPECIAL[random.nextInt(SPECIAL.length)];
                        case 1 -> random.nextInt(5) - 2; // small integers: many ties
                        default -> random.nextGaussian() * Math.pow(10, random.nextInt(-5, 6));
                    };
                }
                int[] masked = random.ints(n / 5, 0, Math.max(n, 1)).sorted().distinct().toArray();
                double[] maskedCopy = v.clone();
                for (int i : masked) {
                    maskedCopy[i] = Double.NEGATIVE_INFINITY;
                }
                int[] expectedRanks = ScoringAsBefore.ranks(maskedCopy);
                int[] best = order.descending(v, masked, 0, masked.length);
                int[] ranks = new int[n];
                for (int r = 0; r < n; r++) {
                    ranks[best[r]] = r + 1;
                }
                assertArrayEquals(expectedRanks, ranks, "n = " + n + ", round " + round);
            }
        }
    }

    @Test
    void shouldPutAllEqualScoresInIndexOrderWhenEveryDigitPassIsSkipped() {
        RankOrder order = new RankOrder(6);
        double[] half = {0.5, 0.5, 0.5, 0.5, 0.5, 0.5};
        assertArrayEquals(new int[] {0, 1, 2, 3, 4, 5}, order.descending(half, new int[0], 0, 0));
        // item 2 masked: it alone falls behind the five equal scores
        assertArrayEquals(new int[] {0, 1, 3, 4, 5, 2}, order.descending(half, new int[] {2}, 0, 1));
    }

    @Test
    void shouldOrderScoresAboveZeroThenZerosThenBelowWhenMostAreZero() {
        RankOrder order = new RankOrder(8);
        double[] v = {0, -0.5, 0.25, 0, -0.0, 0.75, 0, Double.NaN};
        // NaN first as in Double.compare, then 0.75, 0.25, the zeros (−0.0 among them) by index, −0.5
        assertArrayEquals(new int[] {7, 5, 2, 0, 3, 4, 6, 1}, order.descending(v, new int[0], 0, 0));
    }
}
