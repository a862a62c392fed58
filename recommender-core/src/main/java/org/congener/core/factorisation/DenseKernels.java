package org.congener.core.factorisation;

/**
 * The few dense vector operations the solvers spend their time in. Two implementations: a plain
 * scalar loop and one on the JDK's incubating Vector API; {@link #best()} picks the vector one
 * when the module {@code jdk.incubator.vector} is present and falls back to scalar otherwise.
 * Arrays are addressed with offsets so factor rows are used in place.
 */
public interface DenseKernels {

    /** Σ_t a[aOff+t]·b[bOff+t] for t &lt; n. */
    double dot(double[] a, int aOff, double[] b, int bOff, int n);

    /** y[yOff+t] += alpha·x[xOff+t] for t &lt; n; modifies {@code y}. */
    void axpy(double alpha, double[] x, int xOff, double[] y, int yOff, int n);

    /**
     * out[outOff+r] = Σ_t a[aOff+r·n+t]·x[xOff+t] for r &lt; rows: the product of a row-major block of
     * {@code rows} × {@code n} with a vector (for instance the fold-in's products with its rows and its
     * Gram matrix). Several rows are taken per pass so each load of x serves all of them. Each row is
     * summed in the order that {@link #dot} uses, so out[r] equals {@code dot(a, aOff + r·n, x, xOff, n)}
     * bit for bit. Modifies {@code out}.
     */
    void multiply(double[] a, int aOff, int rows, int n, double[] x, int xOff, double[] out, int outOff);

    /**
     * out[outOff+t] += Σ_r s[sOff+r]·a[aOff+r·n+t] for t &lt; n, rows taken in order: the same as
     * {@link #axpy}(s_r, row r, out) for r = 0, 1, …, so each entry equals that sequence of axpys bit
     * for bit, with {@code out} read and written once instead of once per row. Modifies {@code out}.
     */
    default void accumulateRows(double[] a, int aOff, int rows, int n, double[] s, int sOff, double[] out,
                                int outOff) {
        for (int r = 0; r < rows; r++) {
            axpy(s[sOff + r], a, aOff + r * n, out, outOff, n);
        }
    }

    /**
     * out[outOff+t] += Σ_r w[wOff+r]·(a_r·d)·a[aOff+r·n+t] for t &lt; n, with a_r the r-th row of the
     * row-major block and d read from {@code d[dOff..dOff+n)}; returns Σ_t d[dOff+t]·out[outOff+t]
     * after the update. This is Aᵀ·diag(w)·A·d added to out, the data term of a conjugate-gradient
     * product, and d·out, the curvature the step length needs. Each row's dot product and update are
     * taken together so the block is read from memory once, not once for the dot products and once
     * for the updates. The summation order is the implementation's own. Modifies {@code out}.
     */
    default double accumulateProjections(double[] a, int aOff, int rows, int n, double[] w, int wOff, double[] d,
                                         int dOff, double[] out, int outOff) {
        for (int r = 0; r < rows; r++) {
            int row = aOff + r * n;
            axpy(w[wOff + r] * dot(a, row, d, dOff, n), a, row, out, outOff, n);
        }
        return dot(d, dOff, out, outOff, n);
    }

    /**
     * The updates of a conjugate-gradient step of length alpha along d, whose product with the system
     * is ad: x[xOff+t] += alpha·d[t] and r[t] −= alpha·ad[t] for t &lt; n; returns Σ_t r[t]², the new
     * squared residual. Modifies {@code x} and {@code r}.
     */
    default double stepAlong(double alpha, double[] d, double[] ad, double[] x, int xOff, double[] r, int n) {
        axpy(alpha, d, 0, x, xOff, n);
        axpy(-alpha, ad, 0, r, 0, n);
        return dot(r, 0, r, 0, n);
    }

    /** y[t] = x[t] + beta·y[t] for t &lt; n (the next search direction from the residual); modifies {@code y}. */
    default void scaleAndAdd(double beta, double[] x, double[] y, int n) {
        for (int t = 0; t < n; t++) {
            y[t] = x[t] + beta * y[t];
        }
    }

    /**
     * The product Y·x with Y held factor-major: y_it = a[aOff + t·stride + i], factor t's entries of
     * all {@code rows} items side by side, the next factor {@code stride} ≥ rows entries on. For each
     * i &lt; rows, out[outOff+i] = s_i with s_i the chain s ← fma(y_it, x[xOff+t], s) for
     * t = 0, 1, …, n−1 from s = +0.0: one {@link Math#fma} rounding per factor, in factor order, and
     * nothing summed in any other order, so every implementation gives the same bits. Entries of a
     * factor's block from {@code rows} to {@code stride} may be read but never reach out (the block
     * may be padded to whole vectors). Needs a.length ≥ aOff + n·stride. Modifies {@code out} in
     * [outOff, outOff+rows) only.
     */
    default void multiplyFactorMajor(double[] a, int aOff, int rows, int stride, int n, double[] x, int xOff,
                                     double[] out, int outOff) {
        // factor by factor over all rows, out holding the chains, so each row's chain is in factor order
        java.util.Arrays.fill(out, outOff, outOff + rows, 0.0);
        for (int t = 0; t < n; t++) {
            double xt = x[xOff + t];
            int column = aOff + t * stride;
            for (int i = 0; i < rows; i++) {
                out[outOff + i] = Math.fma(a[column + i], xt, out[outOff + i]);
            }
        }
    }

    /**
     * {@link #multiplyFactorMajor(double[], int, int, int, int, double[], int, double[], int)} with the
     * factors held as floats: each y_it is widened to double (exactly) before its multiply-add, so out
     * equals the double product of the widened factors bit for bit.
     */
    default void multiplyFactorMajor(float[] a, int aOff, int rows, int stride, int n, double[] x, int xOff,
                                     double[] out, int outOff) {
        java.util.Arrays.fill(out, outOff, outOff + rows, 0.0);
        for (int t = 0; t < n; t++) {
            double xt = x[xOff + t];
            int column = aOff + t * stride;
            for (int i = 0; i < rows; i++) {
                out[outOff + i] = Math.fma((double) a[column + i], xt, out[outOff + i]);
            }
        }
    }

    /**
     * The factor-major product with several vectors: for c &lt; count, outs[c] gets what
     * {@link #multiplyFactorMajor(float[], int, int, int, int, double[], int, double[], int)} gives for
     * x = xs[c] (read from index 0) and out = outs[c], bit for bit, with the factors read from memory
     * once for all of them. Modifies outs[c][outOff..outOff+rows) for c &lt; count only.
     */
    default void multiplyFactorMajorMany(float[] a, int aOff, int rows, int stride, int n, double[][] xs, int count,
                                         double[][] outs, int outOff) {
        for (int c = 0; c < count; c++) {
            multiplyFactorMajor(a, aOff, rows, stride, n, xs[c], 0, outs[c], outOff);
        }
    }

    /**
     * The same for factors held as doubles. Published factors are floats, so this serves only factor
     * matrices that were never published (tests, a trainer's own); the plain chains are kept for it,
     * one vector after another, and the vector implementation does not repeat them.
     */
    default void multiplyFactorMajorMany(double[] a, int aOff, int rows, int stride, int n, double[][] xs, int count,
                                         double[][] outs, int outOff) {
        for (int c = 0; c < count; c++) {
            multiplyFactorMajor(a, aOff, rows, stride, n, xs[c], 0, outs[c], outOff);
        }
    }

    /**
     * The least and the greatest of v[from..to) by {@link Math#min} and {@link Math#max} (so −0.0 is
     * below 0.0, and a NaN anywhere makes both NaN), into {@code into[0]} and {@code into[1]}; +∞ and
     * −∞ for an empty range. Both are exact whatever order the entries are taken in.
     */
    void minMax(double[] v, int from, int to, double[] into);

    /**
     * The first index t in [from, to) with v[t] &gt; threshold, or {@code to} when there is none: the
     * scan of a top-n selection once its list is full, where nearly every entry is passed over. A NaN
     * entry is never above anything.
     */
    default int firstAbove(double[] v, int from, int to, double threshold) {
        for (int t = from; t < to; t++) {
            if (v[t] > threshold) {
                return t;
            }
        }
        return to;
    }

    /** The plain-loop implementation. */
    static DenseKernels scalar() {
        return ScalarKernels.INSTANCE;
    }

    /** The Vector API implementation when available, else {@link #scalar()}. */
    static DenseKernels best() {
        return KernelChoice.BEST;
    }

    /** Lazy holder so a missing incubator module costs one failed class load, once. */
    final class KernelChoice {
        static final DenseKernels BEST = choose();

        private KernelChoice() {
        }

        private static DenseKernels choose() {
            if (Boolean.getBoolean("congener.scalarKernels")) {
                return ScalarKernels.INSTANCE;
            }
            try {
                Class<?> type = Class.forName("org.congener.core.factorisation.VectorKernels");
                return (DenseKernels) type.getField("INSTANCE").get(null);
            } catch (ReflectiveOperationException | LinkageError e) {
                return ScalarKernels.INSTANCE;
            }
        }
    }
}
