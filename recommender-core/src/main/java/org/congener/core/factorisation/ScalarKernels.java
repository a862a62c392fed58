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

    /** Four rows per pass, each with dot's two accumulators (even and odd t), so the sums equal dot's. */
    @Override
    public void multiply(double[] a, int aOff, int rows, int n, double[] x, int xOff, double[] out, int outOff) {
        int r = 0;
        for (; r + 4 <= rows; r += 4) {
            int o0 = aOff + r * n;
            int o1 = o0 + n;
            int o2 = o1 + n;
            int o3 = o2 + n;
            double e0 = 0;
            double e1 = 0;
            double e2 = 0;
            double e3 = 0;
            double d0 = 0;
            double d1 = 0;
            double d2 = 0;
            double d3 = 0;
            int t = 0;
            for (; t + 1 < n; t += 2) {
                double xe = x[xOff + t];
                double xd = x[xOff + t + 1];
                e0 += a[o0 + t] * xe;
                d0 += a[o0 + t + 1] * xd;
                e1 += a[o1 + t] * xe;
                d1 += a[o1 + t + 1] * xd;
                e2 += a[o2 + t] * xe;
                d2 += a[o2 + t + 1] * xd;
                e3 += a[o3 + t] * xe;
                d3 += a[o3 + t + 1] * xd;
            }
            if (t < n) {
                double xe = x[xOff + t];
                e0 += a[o0 + t] * xe;
                e1 += a[o1 + t] * xe;
                e2 += a[o2 + t] * xe;
                e3 += a[o3 + t] * xe;
            }
            out[outOff + r] = e0 + d0;
            out[outOff + r + 1] = e1 + d1;
            out[outOff + r + 2] = e2 + d2;
            out[outOff + r + 3] = e3 + d3;
        }
        for (; r < rows; r++) {
            out[outOff + r] = dot(a, aOff + r * n, x, xOff, n);
        }
    }

    @Override
    public void minMax(double[] v, int from, int to, double[] into) {
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (int t = from; t < to; t++) {
            lo = Math.min(lo, v[t]);
            hi = Math.max(hi, v[t]);
        }
        into[0] = lo;
        into[1] = hi;
    }

    @Override
    public String toString() {
        return "scalar";
    }
}
