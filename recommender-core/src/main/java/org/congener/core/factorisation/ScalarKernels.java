package org.congener.core.factorisation;

/** Plain Java loops; the reference that the vector kernels are tested against. */
final class ScalarKernels implements DenseKernels {
    static final ScalarKernels INSTANCE = new ScalarKernels();

    private ScalarKernels() {
    }

    @Override
    public double dot(double[] a, int aOff, double[] b, int bOff, int n) {
        double s0 = 0;
        double s1 = 0;
        int t = 0;
        for (; t + 1 < n; t += 2) {
            s0 += a[aOff + t] * b[bOff + t];
            s1 += a[aOff + t + 1] * b[bOff + t + 1];
        }
        if (t < n) {
            s0 += a[aOff + t] * b[bOff + t];
        }
        return s0 + s1;
    }

    @Override
    public void axpy(double alpha, double[] x, int xOff, double[] y, int yOff, int n) {
        for (int t = 0; t < n; t++) {
            y[yOff + t] += alpha * x[xOff + t];
        }
    }

    @Override
    public String toString() {
        return "scalar";
    }
}
