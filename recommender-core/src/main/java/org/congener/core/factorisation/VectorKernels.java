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

    @Override
    public String toString() {
        return "vector(" + SPECIES.length() + " lanes)";
    }
}
