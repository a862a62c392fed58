package org.congener.core.factorisation;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;

class FloatFactorProductTest {

    @Test
    void shouldEqualTheDoubleProductOfTheWidenedFactorsBitForBitWhenFactorsAreFloats() {
        SplittableRandom random = new SplittableRandom(17);
        int[] ranks = {1, 7, 8, 9, 61, 64, 67};
        // row counts below, at and across the widening block
        int[] rowCounts = {0, 1, 5, DenseKernels.WIDEN_BLOCK_ROWS, DenseKernels.WIDEN_BLOCK_ROWS + 3, 1000};
        for (DenseKernels kernels : new DenseKernels[] {DenseKernels.best(), DenseKernels.scalar()}) {
            for (int n : ranks) {
                for (int rows : rowCounts) {
                    float[] narrow = new float[3 + rows * n];
                    double[] wide = new double[narrow.length];
                    for (int t = 0; t < narrow.length; t++) {
                        narrow[t] = (float) random.nextGaussian(0, 0.3);
                        wide[t] = narrow[t];
                    }
                    double[] x = new double[n];
                    for (int t = 0; t < n; t++) {
                        x[t] = random.nextGaussian();
                    }
                    double[] expected = new double[rows + 2];
                    double[] actual = new double[rows + 2];
                    kernels.multiply(wide, 3, rows, n, x, 0, expected, 2);
                    kernels.multiply(narrow, 3, rows, n, x, 0, actual, 2,
                            new double[DenseKernels.WIDEN_BLOCK_ROWS * n]);
                    assertArrayEquals(expected, actual, 0.0, kernels + ", rank " + n + ", rows " + rows);
                    assertEquals(0.0, actual[0] + actual[1], "nothing written before outOff");
                }
            }
        }
    }
}
