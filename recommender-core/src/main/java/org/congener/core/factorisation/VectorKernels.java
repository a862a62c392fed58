package org.congener.core.factorisation;

import jdk.incubator.vector.DoubleVector;
import jdk.incubator.vector.VectorOperators;
import jdk.incubator.vector.VectorSpecies;

/** The same kernels on the incubating Vector API (fused multiply-add over the widest lanes). */
final class VectorKernels implements DenseKernels {
    public static final VectorKernels INSTANCE = new VectorKernels();
    private static final VectorSpecies<Double> SPECIES = DoubleVector.SPECIES_PREFERRED;

    private VectorKernels() {
    }

    @Override
    public double dot(double[] a, int aOff, double[] b, int bOff, int n) {
        DoubleVector acc = DoubleVector.zero(SPECIES);
        int lanes = SPECIES.length();
        int t = 0;
        for (; t + lanes <= n; t += lanes) {
            DoubleVector va = DoubleVector.fromArray(SPECIES, a, aOff + t);
            DoubleVector vb = DoubleVector.fromArray(SPECIES, b, bOff + t);
            acc = va.fma(vb, acc);
        }
        double s = acc.reduceLanes(VectorOperators.ADD);
        for (; t < n; t++) {
            s += a[aOff + t] * b[bOff + t];
        }
        return s;
    }

    @Override
    public void axpy(double alpha, double[] x, int xOff, double[] y, int yOff, int n) {
        int lanes = SPECIES.length();
        DoubleVector va = DoubleVector.broadcast(SPECIES, alpha);
        int t = 0;
        for (; t + lanes <= n; t += lanes) {
            DoubleVector vx = DoubleVector.fromArray(SPECIES, x, xOff + t);
            DoubleVector vy = DoubleVector.fromArray(SPECIES, y, yOff + t);
            vx.fma(va, vy).intoArray(y, yOff + t);
        }
        for (; t < n; t++) {
            y[yOff + t] += alpha * x[xOff + t];
        }
    }

    /**
     * Four rows per pass: x is loaded once per lane block for the four, and the four accumulator chains
     * are independent, so the fused multiply-adds of one row do not wait on each other's latency.
     */
    @Override
    public void multiply(double[] a, int aOff, int rows, int n, double[] x, int xOff, double[] out, int outOff) {
        int lanes = SPECIES.length();
        int body = n - n % lanes;
        int r = 0;
        for (; r + 4 <= rows; r += 4) {
            int o0 = aOff + r * n;
            int o1 = o0 + n;
            int o2 = o1 + n;
            int o3 = o2 + n;
            DoubleVector acc0 = DoubleVector.zero(SPECIES);
            DoubleVector acc1 = acc0;
            DoubleVector acc2 = acc0;
            DoubleVector acc3 = acc0;
            for (int t = 0; t < body; t += lanes) {
                DoubleVector vx = DoubleVector.fromArray(SPECIES, x, xOff + t);
                acc0 = DoubleVector.fromArray(SPECIES, a, o0 + t).fma(vx, acc0);
                acc1 = DoubleVector.fromArray(SPECIES, a, o1 + t).fma(vx, acc1);
                acc2 = DoubleVector.fromArray(SPECIES, a, o2 + t).fma(vx, acc2);
                acc3 = DoubleVector.fromArray(SPECIES, a, o3 + t).fma(vx, acc3);
            }
            double s0 = acc0.reduceLanes(VectorOperators.ADD);
            double s1 = acc1.reduceLanes(VectorOperators.ADD);
            double s2 = acc2.reduceLanes(VectorOperators.ADD);
            double s3 = acc3.reduceLanes(VectorOperators.ADD);
            // the tail in dot's order: after the lane sum, one product at a time
            for (int t = body; t < n; t++) {
                double xt = x[xOff + t];
                s0 += a[o0 + t] * xt;
                s1 += a[o1 + t] * xt;
                s2 += a[o2 + t] * xt;
                s3 += a[o3 + t] * xt;
            }
            out[outOff + r] = s0;
            out[outOff + r + 1] = s1;
            out[outOff + r + 2] = s2;
            out[outOff + r + 3] = s3;
        }
        for (; r < rows; r++) {
            out[outOff + r] = dot(a, aOff + r * n, x, xOff, n);
        }
    }

    @Override
    public String toString() {
        return "vector(" + SPECIES.length() + " lanes)";
    }
}
