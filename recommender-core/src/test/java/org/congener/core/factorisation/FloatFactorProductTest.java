package org.congener.core.factorisation;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;

/** The factor-major product with the factors held as floats against the same factors held as doubles. */
class FloatFactorProductTest {

    @Test
    void shouldEqualTheDoubleProductOfTheWidenedFactorsBitForBitWhenFactorsAreFloats() {
        SplittableRandom random = new SplittableRandom(17);
        int[] ranks = {1, 7, 8, 9, 61, 64, 67};
        int[] rowCounts = {0, 1, 5, 31, 35, 1000, 1003};
        for (DenseKernels kernels : new DenseKernels[] {DenseKernels.best(), DenseKernels.scalar()}) {
            for (int n : ranks) {
                for (int rows : rowCounts) {
                    int stride = rows + random.nextInt(20);
                    float[] narrow = floatFactors(random, 3 + n * stride);
                    double[] wide = widened(narrow);
                    double[] x = new double[n];
                    for (int t = 0; t < n; t++) {
                        x[t] = random.nextGaussian();
                    }
                    double[] expected = new double[rows + 2];
                    double[] actual = new double[rows + 2];
                    kernels.multiplyFactorMajor(wide, 3, rows, stride, n, x, 0, expected, 2);
                    kernels.multiplyFactorMajor(narrow, 3, rows, stride, n, x, 0, actual, 2);
                    String where = kernels + ", rank " + n + ", rows " + rows + ", stride " + stride;
                    for (int r = 0; r < rows + 2; r++) {
                        assertEquals(Double.doubleToLongBits(expected[r]), Double.doubleToLongBits(actual[r]),
                                where + ", cell " + r);
                    }
                    assertEquals(0.0, actual[0] + actual[1], "nothing written before outOff");
                }
            }
        }
    }

    @Test
    void shouldGiveEachVectorItsOneVectorProductBitForBitWhenSeveralAreMultipliedInOnePass() {
        SplittableRandom random = new SplittableRandom(23);
        int[] ranks = {1, 9, 64, 67};
        int[] rowCounts = {0, 3, 32, 69, 1000, 1001};
        for (DenseKernels kernels : new DenseKernels[] {DenseKernels.best(), DenseKernels.scalar()}) {
            for (int n : ranks) {
                for (int rows : rowCounts) {
                    int stride = (rows + FactorColumns.PANEL - 1) / FactorColumns.PANEL * FactorColumns.PANEL;
                    float[] narrow = floatFactors(random, 3 + n * stride);
                    double[] wide = widened(narrow);
                    int count = 1 + random.nextInt(9);
                    double[][] xs = new double[count + 1][n];
                    for (double[] x : xs) {
                        for (int t = 0; t < n; t++) {
                            x[t] = random.nextGaussian();
                        }
                    }
                    double[][] fromFloats = new double[count + 1][rows + 2];
                    double[][] fromDoubles = new double[count + 1][rows + 2];
                    kernels.multiplyFactorMajorMany(narrow, 3, rows, stride, n, xs, count, fromFloats, 2);
                    kernels.multiplyFactorMajorMany(wide, 3, rows, stride, n, xs, count, fromDoubles, 2);
                    for (int c = 0; c <= count; c++) {
                        double[] expected = new double[rows + 2];
                        if (c < count) {
                            kernels.multiplyFactorMajor(narrow, 3, rows, stride, n, xs[c], 0, expected, 2);
                        }
                        String where = kernels + ", rank " + n + ", rows " + rows + ", vector " + c + " of " + count;
                        for (int r = 0; r < rows + 2; r++) {
                            assertEquals(Double.doubleToLongBits(expected[r]), Double.doubleToLongBits(fromFloats[c][r]),
                                    where + ", row " + r + " (floats)");
                            assertEquals(Double.doubleToLongBits(expected[r]), Double.doubleToLongBits(fromDoubles[c][r]),
                                    where + ", row " + r + " (doubles)");
                        }
                    }
                }
            }
        }
    }

    /** Factors as published: floats, here Gaussian with the spread of fitted ones. */
    private static float[] floatFactors(SplittableRandom random, int length) {
        float[] narrow = new float[length];
        for (int t = 0; t < length; t++) {
            narrow[t] = (float) random.nextGaussian(0, 0.3);
        }
        return narrow;
    }

    private static double[] widened(float[] narrow) {
        double[] wide = new double[narrow.length];
        for (int t = 0; t < narrow.length; t++) {
            wide[t] = narrow[t];
        }
        return wide;
    }
}
