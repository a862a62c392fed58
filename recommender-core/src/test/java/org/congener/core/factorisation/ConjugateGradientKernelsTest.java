package org.congener.core.factorisation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.SplittableRandom;
import jdk.incubator.vector.DoubleVector;
import org.junit.jupiter.api.Test;

/**
 * The kernels of the converged fold-in's CG step: {@link DenseKernels#accumulateProjections},
 * {@link DenseKernels#stepAlong} and {@link DenseKernels#scaleAndAdd}. Vector and scalar sum in different
 * orders, so both are held to a plain loop within a rounding bound, for ranks that are and are not
 * multiples of the lane count (including exactly four and eight lane blocks, which the vector kernel
 * treats apart) and row counts from none to many.
 */
class ConjugateGradientKernelsTest {
    private static final int LANES = DoubleVector.SPECIES_PREFERRED.length();
    private static final int[] RANKS = {1, 3, LANES - 1, LANES, 13, 16, 4 * LANES, 8 * LANES, 8 * LANES + 1, 64, 100};
    private static final int[] ROWS = {0, 1, 7, 64, 257};
    private static final DenseKernels[] KERNELS = {DenseKernels.best(), DenseKernels.scalar()};
    /** Relative to the sum of the magnitudes of the terms: far above the rounding of these short sums. */
    private static final double TOLERANCE = 1e-12;
    private static final double UNTOUCHED = -7.25;

    @Test
    void shouldMatchAPlainLoopWhenProjectionsOfRowsAreAccumulated() {
        SplittableRandom random = new SplittableRandom(21);
        for (int n : RANKS) {
            for (int rows : ROWS) {
                Projections c = Projections.random(random, rows, n);
                for (DenseKernels kernels : KERNELS) {
                    double[] out = c.start.clone();
                    double curvature = kernels.accumulateProjections(c.a, c.aOff, rows, n, c.w, c.wOff, c.d, c.dOff,
                            out, c.outOff);
                    String where = kernels + ", rank " + n + ", rows " + rows;
                    for (int t = 0; t < n; t++) {
                        assertEquals(c.expected[t], out[c.outOff + t], TOLERANCE * c.magnitude[t],
                                where + ", entry " + t);
                    }
                    assertEquals(c.expectedCurvature, curvature, TOLERANCE * c.curvatureMagnitude, where + ", d·out");
                    assertOutsideUntouched(c.start, out, c.outOff, n, where);
                }
            }
        }
    }

    @Test
    void shouldLeaveOutBitForBitAndReturnItsCurvatureWhenThereAreNoRows() {
        SplittableRandom random = new SplittableRandom(22);
        for (int n : RANKS) {
            Projections c = Projections.random(random, 0, n);
            for (DenseKernels kernels : KERNELS) {
                double[] out = c.start.clone();
                double curvature = kernels.accumulateProjections(c.a, c.aOff, 0, n, c.w, c.wOff, c.d, c.dOff, out,
                        c.outOff);
                assertTrue(Arrays.equals(c.start, out), kernels + ", rank " + n);
                assertEquals(kernels.dot(c.d, c.dOff, c.start, c.outOff, n), curvature,
                        TOLERANCE * c.curvatureMagnitude, kernels + ", rank " + n);
            }
        }
    }

    @Test
    void shouldAgreeBetweenVectorAndScalarWhenProjectionsAreAccumulated() {
        SplittableRandom random = new SplittableRandom(23);
        for (int n : RANKS) {
            for (int rows : ROWS) {
                Projections c = Projections.random(random, rows, n);
                double[] vector = c.start.clone();
                double[] scalar = c.start.clone();
                double vectorCurvature = DenseKernels.best().accumulateProjections(c.a, c.aOff, rows, n, c.w, c.wOff,
                        c.d, c.dOff, vector, c.outOff);
                double scalarCurvature = DenseKernels.scalar().accumulateProjections(c.a, c.aOff, rows, n, c.w,
                        c.wOff, c.d, c.dOff, scalar, c.outOff);
                for (int t = 0; t < n; t++) {
                    assertEquals(scalar[c.outOff + t], vector[c.outOff + t], 2 * TOLERANCE * c.magnitude[t],
                            "rank " + n + ", rows " + rows + ", entry " + t);
                }
                assertEquals(scalarCurvature, vectorCurvature, 2 * TOLERANCE * c.curvatureMagnitude,
                        "rank " + n + ", rows " + rows);
            }
        }
    }

    @Test
    void shouldMoveXAndRAndReturnTheNewSquaredResidualWhenStepping() {
        SplittableRandom random = new SplittableRandom(24);
        for (int n : RANKS) {
            double alpha = random.nextDouble(-2, 2);
            double[] d = random.doubles(n, -1, 1).toArray();
            double[] ad = random.doubles(n, -1, 1).toArray();
            int xOff = random.nextInt(4);
            double[] x0 = random.doubles(xOff + n + 2, -1, 1).toArray();
            double[] r0 = random.doubles(n, -1, 1).toArray();
            double[] expectedX = x0.clone();
            double[] expectedR = r0.clone();
            double expectedSquares = 0;
            for (int t = 0; t < n; t++) {
                expectedX[xOff + t] = x0[xOff + t] + alpha * d[t];
                expectedR[t] = r0[t] - alpha * ad[t];
                expectedSquares += expectedR[t] * expectedR[t];
            }
            for (DenseKernels kernels : KERNELS) {
                double[] x = x0.clone();
                double[] r = r0.clone();
                double squares = kernels.stepAlong(alpha, d, ad, x, xOff, r, n);
                String where = kernels + ", rank " + n;
                for (int t = 0; t < x.length; t++) {
                    assertEquals(expectedX[t], x[t], 1e-15 * (Math.abs(x0[t]) + Math.abs(alpha)), where + ", x " + t);
                }
                for (int t = 0; t < n; t++) {
                    assertEquals(expectedR[t], r[t], 1e-15 * (Math.abs(r0[t]) + Math.abs(alpha)), where + ", r " + t);
                }
                assertEquals(expectedSquares, squares, 1e-14 * (expectedSquares + n), where + ", r·r");
            }
        }
    }

    @Test
    void shouldAddTheScaledVectorToXWhenScalingAndAdding() {
        SplittableRandom random = new SplittableRandom(25);
        for (int n : RANKS) {
            double beta = random.nextDouble(-2, 2);
            double[] x = random.doubles(n, -1, 1).toArray();
            double[] y0 = random.doubles(n + 3, -1, 1).toArray();
            for (DenseKernels kernels : KERNELS) {
                double[] y = y0.clone();
                kernels.scaleAndAdd(beta, x, y, n);
                for (int t = 0; t < n; t++) {
                    assertEquals(x[t] + beta * y0[t], y[t], 1e-15 * (Math.abs(x[t]) + Math.abs(beta)),
                            kernels + ", rank " + n + ", entry " + t);
                }
                for (int t = n; t < y.length; t++) {
                    assertEquals(y0[t], y[t], 0.0, kernels + ", rank " + n + ", cell " + t + " past the end");
                }
            }
        }
    }

    private static void assertOutsideUntouched(double[] start, double[] out, int outOff, int n, String where) {
        for (int i = 0; i < out.length; i++) {
            if (i < outOff || i >= outOff + n) {
                assertEquals(UNTOUCHED, out[i], 0.0, where + ", cell " + i + " outside the output range");
            }
        }
    }

    /**
     * A block of rows with offsets, weights of both signs, a direction, a starting out with guard cells,
     * and out + Σ_r w_r (a_r·d) a_r and d·out by plain loops, with the sum of the magnitudes of each
     * entry's terms as the scale of its rounding.
     */
    private record Projections(double[] a, int aOff, double[] w, int wOff, double[] d, int dOff, double[] start,
                               int outOff, double[] expected, double[] magnitude, double expectedCurvature,
                               double curvatureMagnitude) {
        static Projections random(SplittableRandom random, int rows, int n) {
            int aOff = random.nextInt(5);
            int wOff = random.nextInt(3);
            int dOff = random.nextInt(4);
            int outOff = 1 + random.nextInt(3);
            double[] a = random.doubles(aOff + rows * n + 3, -1, 1).toArray();
            double[] w = random.doubles(wOff + rows + 1, -2, 5).toArray();
            double[] d = random.doubles(dOff + n + 2, -1, 1).toArray();
            double[] start = new double[outOff + n + 2];
            Arrays.fill(start, UNTOUCHED);
            for (int t = 0; t < n; t++) {
                start[outOff + t] = random.nextDouble(-1, 1);
            }
            double[] expected = new double[n];
            double[] magnitude = new double[n];
            for (int t = 0; t < n; t++) {
                expected[t] = start[outOff + t];
                magnitude[t] = Math.abs(start[outOff + t]);
            }
            for (int r = 0; r < rows; r++) {
                double along = 0;
                double alongMagnitude = 0;
                for (int t = 0; t < n; t++) {
                    along += a[aOff + r * n + t] * d[dOff + t];
                    alongMagnitude += Math.abs(a[aOff + r * n + t] * d[dOff + t]);
                }
                for (int t = 0; t < n; t++) {
                    double row = a[aOff + r * n + t];
                    expected[t] += w[wOff + r] * along * row;
                    magnitude[t] += Math.abs(w[wOff + r] * row) * alongMagnitude;
                }
            }
            double curvature = 0;
            double curvatureMagnitude = 0;
            for (int t = 0; t < n; t++) {
                curvature += d[dOff + t] * expected[t];
                curvatureMagnitude += Math.abs(d[dOff + t]) * magnitude[t];
            }
            return new Projections(a, aOff, w, wOff, d, dOff, start, outOff, expected, magnitude, curvature,
                    curvatureMagnitude);
        }
    }
}
