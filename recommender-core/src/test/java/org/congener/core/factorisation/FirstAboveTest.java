package org.congener.core.factorisation;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

class FirstAboveTest {

    /** The plain scan the kernels must agree with. */
    private static int firstAboveByScan(double[] v, int from, int to, double threshold) {
        for (int t = from; t < to; t++) {
            if (v[t] > threshold) {
                return t;
            }
        }
        return to;
    }

    @Test
    void shouldFindTheFirstEntryAboveTheThresholdWhenRunsHoldTiesNaNsAndInfinities() {
        SplittableRandom random = new SplittableRandom(17);
        double[] specials = {Double.NaN, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY, 0.0, -0.0};
        for (DenseKernels kernels : new DenseKernels[] {DenseKernels.best(), DenseKernels.scalar()}) {
            for (int round = 0; round < 5000; round++) {
                int length = random.nextInt(70);
                int from = random.nextInt(5);
                double[] v = new double[from + length + 2];
                for (int t = 0; t < v.length; t++) {
                    // few distinct values, so ties with the threshold are common
                    v[t] = random.nextInt(8) == 0 ? specials[random.nextInt(specials.length)] : random.nextInt(6) / 2.0;
                }
                double threshold = switch (round % 4) {
                    case 0 -> random.nextInt(6) / 2.0;
                    case 1 -> Double.NEGATIVE_INFINITY;
                    case 2 -> Double.NaN;
                    default -> 2.6;
                };
                int expected = firstAboveByScan(v, from, from + length, threshold);
                assertEquals(expected, kernels.firstAbove(v, from, from + length, threshold),
                        kernels + ", round " + round + ", threshold " + threshold);
            }
        }
    }

    @Test
    void shouldAnswerTheEndWhenNothingIsAboveAndLeaveEntriesPastTheEndUnread() {
        double[] v = {1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12, 13, 14, 15, 16, 17, 100};
        for (DenseKernels kernels : new DenseKernels[] {DenseKernels.best(), DenseKernels.scalar()}) {
            assertEquals(17, kernels.firstAbove(v, 0, 17, 50.0), kernels + ": the entry past the end is not read");
            assertEquals(17, kernels.firstAbove(v, 0, 18, 50.0), kernels + ": the last entry is found");
            assertEquals(9, kernels.firstAbove(v, 3, 17, 9.0), kernels + ": strictly above, not equal");
            assertEquals(5, kernels.firstAbove(v, 5, 5, 0.0), kernels + ": an empty range");
        }
    }
}
