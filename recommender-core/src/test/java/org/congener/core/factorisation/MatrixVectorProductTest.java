package org.congener.core.factorisation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;
import jdk.incubator.vector.DoubleVector;
import org.junit.jupiter.api.Test;

/**
 * {@link DenseKernels#multiply}, out = A·x over a row-major block, for ranks that are and are not
 * multiples of the vector length and row counts that are and are not multiples of the rows per pass.
 */
class MatrixVectorProductTest {
    private static final int LANES = DoubleVector.SPECIES_PREFERRED.length();
    private static final int[] RANKS = {1, LANES - 1, LANES, LANES + 1, 2 * LANES + 3, 8 * LANES, 61, 64, 67};
    private static final int[] ROWS = {0, 1, 3, 4, 5, 13, 64};
    /** Relative to Σ_t |a_t·x_t|: the rounding of a sum of n products is far below this for n ≤ 67. */
    private static final double TOLERANCE = 1e-12;
    private static final double UNTOUCHED = -7.25;

    @Test
    void shouldUseTheVectorKernelsWhenTheIncubatorModuleIsPresent() {
        // the test JVM runs with --add-modules=jdk.incubator.vector, so the comparisons below are vector
        // against scalar and not scalar against itself
        assertTrue(DenseKernels.best().toString().startsWith("vector"), DenseKernels.best().toString());
    }

    @Test
    void shouldEqualOneAxpyPerRowBitForBitWhenRowsAreAccumulatedInOnePass() {
        SplittableRandom random = new SplittableRandom(9);
        for (DenseKernels kernels : new DenseKernels[] {DenseKernels.best(), DenseKernels.scalar()}) {
            for (int n : RANKS) {
                for (int rows : ROWS) {
                    double[] a = new double[2 + rows * n];
                    double[] s = new double[1 + rows];
                    double[] start = new double[n + 3];
                    a = random.doubles(a.length, -2, 2).toArray();
                    s = random.doubles(s.length, -3, 3).toArray();
                    start = random.doubles(start.length, -1, 1).toArray();
                    double[] expected = start.clone();
                    for (int r = 0; r < rows; r++) {
                        kernels.axpy(s[1 + r], a, 2 + r * n, expected, 3, n);
                    }
                    double[] actual = start.clone();
                    kernels.accumulateRows(a, 2, rows, n, s, 1, actual, 3);
                    for (int t = 0; t < expected.length; t++) {
                        assertEquals(Double.doubleToLongBits(expected[t]), Double.doubleToLongBits(actual[t]),
                                kernels + ", rank " + n + ", rows " + rows + ", entry " + t);
                    }
                }
            }
        }
    }

    @Test
    void shouldMatchANaiveLoopAndTheScalarKernelWhenRowsAndRankVary() {
        SplittableRandom random = new SplittableRandom(5);
        for (int n : RANKS) {
            for (int rows : ROWS) {
                Case c = Case.random(random, rows, n);
                double[] vector = c.run(DenseKernels.best());
                double[] scalar = c.run(DenseKernels.scalar());
                for (int r = 0; r < rows; r++) {
                    double naive = 0;
                    double magnitude = 0;
                    for (int t = 0; t < n; t++) {
                        double p = c.a[c.aOff + r * n + t] * c.x[c.xOff + t];
                        naive += p;
                        magnitude += Math.abs(p);
                    }
                    String where = "rank " + n + ", rows " + rows + ", row " + r;
                    assertEquals(naive, vector[c.outOff + r], TOLERANCE * magnitude, "vector, " + where);
                    assertEquals(naive, scalar[c.outOff + r], TOLERANCE * magnitude, "scalar, " + where);
                }
                c.assertOutsideUntouched(vector);
                c.assertOutsideUntouched(scalar);
            }
        }
    }

    @Test
    void shouldEqualTheRowDotProductsBitForBitWhenTheKernelIsTheSame() {
        // the CF scores were one dot per row before; the blocked product must not change a single score
        SplittableRandom random = new SplittableRandom(6);
        for (DenseKernels kernels : new DenseKernels[] {DenseKernels.best(), DenseKernels.scalar()}) {
            for (int n : RANKS) {
                for (int rows : ROWS) {
                    Case c = Case.random(random, rows, n);
                    double[] out = c.run(kernels);
                    for (int r = 0; r < rows; r++) {
                        double dot = kernels.dot(c.a, c.aOff + r * n, c.x, c.xOff, n);
                        assertEquals(Double.doubleToRawLongBits(dot), Double.doubleToRawLongBits(out[c.outOff + r]),
                                kernels + ", rank " + n + ", rows " + rows + ", row " + r);
                    }
                }
            }
        }
    }

    /** A block with a leading offset, a vector with an offset and an output with guard cells around it. */
    private record Case(double[] a, int aOff, int rows, int n, double[] x, int xOff, int outOff) {
        static Case random(SplittableRandom random, int rows, int n) {
            int aOff = random.nextInt(5);
            int xOff = random.nextInt(5);
            double[] a = random.doubles(aOff + rows * n + 3, -1, 1).toArray();
            double[] x = random.doubles(xOff + n + 2, -1, 1).toArray();
            return new Case(a, aOff, rows, n, x, xOff, 2);
        }

        double[] run(DenseKernels kernels) {
            double[] out = new double[outOff + rows + 2];
            java.util.Arrays.fill(out, UNTOUCHED);
            kernels.multiply(a, aOff, rows, n, x, xOff, out, outOff);
            return out;
        }

        void assertOutsideUntouched(double[] out) {
            for (int i = 0; i < out.length; i++) {
                if (i < outOff || i >= outOff + rows) {
                    assertEquals(UNTOUCHED, out[i], 0.0, "cell " + i + " outside the output range");
                }
            }
        }
    }
}
