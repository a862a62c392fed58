package org.congener.core.factorisation;

/**
 * The side held fixed in a half-step: its factors Y and their Gram matrix YᵀY (k × k, row-major).
 * A published model version carries exactly this for its items, so the streams app folds in users
 * without recomputing YᵀY.
 */
public record FixedFactors(FactorMatrix factors, double[] gram) {
    public FixedFactors {
        int k = factors.rank();
        if (gram.length != k * k) {
            throw new IllegalArgumentException("gram has " + gram.length + " entries, not " + k + "²");
        }
    }

    public static FixedFactors of(FactorMatrix factors) {
        try (ParallelRows single = new ParallelRows(1)) {
            return new FixedFactors(factors, Gram.of(factors, single, DenseKernels.best()));
        }
    }

    public int rank() {
        return factors.rank();
    }
}
