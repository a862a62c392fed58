package org.congener.core.factorisation;

/**
 * YᵀY = Σ_i y_i y_iᵀ, the k × k Gram matrix of a factor matrix (row-major, full symmetric). Hu, Koren
 * &amp; Volinsky 2008, section 4: computed once per half-step, it lets every user's system cost
 * O(n_u·k²) instead of O(n·k²).
 */
public final class Gram {
    /** Fixed block count so the summation order, and so the result, does not depend on threads. */
    private static final int BLOCKS = 16;

    private Gram() {
    }

    public static double[] of(FactorMatrix y, ParallelRows parallel, DenseKernels kernels) {
        int k = y.rank();
        double[][] partial = new double[BLOCKS][];
        int n = y.rows();
        parallel.forEachBlock(BLOCKS, block -> {
            double[] g = new double[k * k];
            int from = (int) ((long) n * block / BLOCKS);
            int to = (int) ((long) n * (block + 1) / BLOCKS);
            double[] data = y.data();
            for (int r = from; r < to; r++) {
                int off = r * k;
                for (int a = 0; a < k; a++) {
                    // upper triangle only: row a from column a
                    kernels.axpy(data[off + a], data, off + a, g, a * k + a, k - a);
                }
            }
            partial[block] = g;
        });
        double[] gram = new double[k * k];
        for (double[] g : partial) {
            for (int t = 0; t < gram.length; t++) {
                gram[t] += g[t];
            }
        }
        for (int a = 0; a < k; a++) {
            for (int b = a + 1; b < k; b++) {
                gram[b * k + a] = gram[a * k + b];
            }
        }
        return gram;
    }
}
