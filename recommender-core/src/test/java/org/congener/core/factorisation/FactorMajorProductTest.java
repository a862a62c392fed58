package org.congener.core.factorisation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.SplittableRandom;
import jdk.incubator.vector.DoubleVector;
import org.junit.jupiter.api.Test;

/**
 * {@link DenseKernels#multiplyFactorMajor} and {@link DenseKernels#multiplyFactorMajorMany} against
 * their contract, each item's chain of fused multiply-adds computed here by its own loop
 * ({@link Block#chain}); the vector and the scalar kernels must both give those bits. Item counts on
 * and (mostly odd) off the multiples of the lanes and of the four-block groups, ranks on and off the
 * multiples of eight, strides unpadded (the last block ends with the array), padded with zeros as
 * {@link FactorColumns} pads, and padded with NaN (which must never reach a score).
 */
class FactorMajorProductTest {
    private static final int LANES = DoubleVector.SPECIES_PREFERRED.length();
    private static final int[] ROWS = {1, LANES - 1, 4 * LANES, 4 * LANES + 3, 13 * LANES + 5, 1001};
    private static final int[] RANKS = {1, 3, 8, 13, 61, 64, 67};
    private static final double UNTOUCHED = -7.25;
    private static final DenseKernels[] KERNELS = {DenseKernels.best(), DenseKernels.scalar()};
    /** Unit roundoff of double. */
    private static final double U = Math.ulp(1.0) / 2;

    /** Factor-major factors of {@code rows} items at rank n, at offset aOff, in both precisions. */
    private record Block(float[] floats, double[] doubles, int aOff, int rows, int stride, int n) {
        /** @param padding 0: stride = rows; 1: padded to {@link FactorColumns#PANEL} with zeros; 2: NaN padding */
        static Block random(SplittableRandom random, int rows, int n, int padding) {
            int stride = switch (padding) {
                case 0 -> rows;
                case 1 -> (rows + FactorColumns.PANEL - 1) / FactorColumns.PANEL * FactorColumns.PANEL;
                default -> rows + LANES + 3;
            };
            int aOff = 3;
            float[] floats = new float[aOff + n * stride];
            double[] doubles = new double[floats.length];
            Arrays.fill(floats, Float.NaN);
            Arrays.fill(doubles, Double.NaN);
            for (int t = 0; t < n; t++) {
                for (int i = 0; i < stride; i++) {
                    int at = aOff + t * stride + i;
                    if (i < rows) {
                        floats[at] = (float) random.nextGaussian(0, 0.3);
                        // not float values, so the double kernels see 53-bit factors
                        doubles[at] = random.nextGaussian(0, 0.3);
                    } else if (padding == 1) {
                        floats[at] = 0;
                        doubles[at] = 0;
                    }
                }
            }
            return new Block(floats, doubles, aOff, rows, stride, n);
        }

        double y(boolean narrow, int item, int factor) {
            int at = aOff + factor * stride + item;
            return narrow ? floats[at] : doubles[at];
        }

        /** The contract's chain for one item, one fused multiply-add per factor in order. */
        double chain(boolean narrow, int item, double[] x, int xOff) {
            double s = 0.0;
            for (int t = 0; t < n; t++) {
                s = Math.fma(y(narrow, item, t), x[xOff + t], s);
            }
            return s;
        }

        void multiply(DenseKernels kernels, boolean narrow, double[] x, int xOff, double[] out, int outOff) {
            if (narrow) {
                kernels.multiplyFactorMajor(floats, aOff, rows, stride, n, x, xOff, out, outOff);
            } else {
                kernels.multiplyFactorMajor(doubles, aOff, rows, stride, n, x, xOff, out, outOff);
            }
        }

        void multiplyMany(DenseKernels kernels, boolean narrow, double[][] xs, int count, double[][] outs,
                          int outOff) {
            if (narrow) {
                kernels.multiplyFactorMajorMany(floats, aOff, rows, stride, n, xs, count, outs, outOff);
            } else {
                kernels.multiplyFactorMajorMany(doubles, aOff, rows, stride, n, xs, count, outs, outOff);
            }
        }
    }

    private static double[] vector(SplittableRandom random, int length) {
        return random.doubles(length, -1, 1).toArray();
    }

    private static double[] untouched(int length) {
        double[] out = new double[length];
        Arrays.fill(out, UNTOUCHED);
        return out;
    }

    private static void assertBits(double expected, double actual, String where) {
        assertEquals(Double.doubleToRawLongBits(expected), Double.doubleToRawLongBits(actual),
                where + ": " + expected + " vs " + actual);
    }

    @Test
    void shouldGiveEachItemItsSequentialFmaChainBitForBitWhenOneVectorIsMultiplied() {
        SplittableRandom random = new SplittableRandom(41);
        for (int rows : ROWS) {
            for (int n : RANKS) {
                for (int padding = 0; padding < 3; padding++) {
                    Block block = Block.random(random, rows, n, padding);
                    int xOff = 2;
                    int outOff = 2;
                    double[] x = vector(random, xOff + n + 1);
                    for (boolean narrow : new boolean[] {true, false}) {
                        for (DenseKernels kernels : KERNELS) {
                            double[] out = untouched(outOff + rows + 3);
                            block.multiply(kernels, narrow, x, xOff, out, outOff);
                            String where = kernels + (narrow ? " floats" : " doubles") + ", rows " + rows + ", rank "
                                    + n + ", stride " + block.stride();
                            for (int i = 0; i < out.length; i++) {
                                double expected = i < outOff || i >= outOff + rows ? UNTOUCHED
                                        : block.chain(narrow, i - outOff, x, xOff);
                                assertBits(expected, out[i], where + ", cell " + i);
                            }
                        }
                    }
                }
            }
        }
    }

    @Test
    void shouldGiveEachVectorItsOneVectorBitsWhenOneToNineVectorsAreMultipliedTogether() {
        SplittableRandom random = new SplittableRandom(43);
        int[] rowCounts = {LANES - 1, 4 * LANES + 3, 13 * LANES + 5, 1001};
        int[] ranks = {1, 13, 64, 67};
        for (int rows : rowCounts) {
            for (int n : ranks) {
                for (int padding = 0; padding < 3; padding++) {
                    Block block = Block.random(random, rows, n, padding);
                    for (int count = 1; count <= 9; count++) {
                        // one vector and one output past count, which must stay as they are
                        double[][] xs = new double[count + 1][];
                        double[][] outs = new double[count + 1][];
                        for (int c = 0; c <= count; c++) {
                            xs[c] = vector(random, n);
                        }
                        for (boolean narrow : new boolean[] {true, false}) {
                            for (DenseKernels kernels : KERNELS) {
                                int outOff = 1;
                                for (int c = 0; c <= count; c++) {
                                    outs[c] = untouched(outOff + rows + 2);
                                }
                                block.multiplyMany(kernels, narrow, xs, count, outs, outOff);
                                for (int c = 0; c <= count; c++) {
                                    String where = kernels + (narrow ? " floats" : " doubles") + ", rows " + rows
                                            + ", rank " + n + ", stride " + block.stride() + ", vector " + c + " of "
                                            + count;
                                    for (int i = 0; i < outs[c].length; i++) {
                                        boolean written = c < count && i >= outOff && i < outOff + rows;
                                        double expected = written ? block.chain(narrow, i - outOff, xs[c], 0)
                                                : UNTOUCHED;
                                        assertBits(expected, outs[c][i], where + ", cell " + i);
                                    }
                                }
                            }
                        }
                    }
                }
            }
        }
    }

    @Test
    void shouldAgreeWithAPlainDoubleLoopWithinTheRoundingOfTwoSumsOfKProducts() {
        // Each of the chain and the plain loop s += y·x is within γ_n·Σ|y_t·x_t| of the exact sum, with
        // γ_n = n·u/(1 − n·u) (recursive summation; the chain rounds once per step, the loop twice), so
        // they differ by at most 2·γ_n·Σ|y_t·x_t|, which 2.01·n·u bounds for n ≤ 67.
        SplittableRandom random = new SplittableRandom(47);
        for (int rows : ROWS) {
            for (int n : RANKS) {
                Block block = Block.random(random, rows, n, 1);
                double[] x = vector(random, n);
                for (boolean narrow : new boolean[] {true, false}) {
                    for (DenseKernels kernels : KERNELS) {
                        double[] out = new double[rows];
                        block.multiply(kernels, narrow, x, 0, out, 0);
                        for (int i = 0; i < rows; i++) {
                            double plain = 0;
                            double magnitude = 0;
                            for (int t = 0; t < n; t++) {
                                double p = block.y(narrow, i, t) * x[t];
                                plain += p;
                                magnitude += Math.abs(p);
                            }
                            double bound = 2.01 * n * U * magnitude;
                            assertTrue(Math.abs(out[i] - plain) <= bound, kernels + (narrow ? " floats" : " doubles")
                                    + ", rows " + rows + ", rank " + n + ", item " + i + ": " + out[i] + " vs " + plain
                                    + ", bound " + bound);
                        }
                    }
                }
            }
        }
    }
}
