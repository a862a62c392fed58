package org.congener.core.factorisation;

/** A fitted BPR-MF model: x̂_ui = x_u · y_i + b_i. */
public record BprModel(FactorMatrix userFactors, FactorMatrix itemFactors, double[] itemBias, BprConfig config) {

    public double score(int user, int item) {
        return FactorMatrix.dot(userFactors, user, itemFactors, item) + itemBias[item];
    }

    public void scoreAll(int user, double[] out) {
        DenseKernels kernels = DenseKernels.best();
        int k = config.rank();
        double[] x = userFactors.data();
        double[] y = itemFactors.data();
        for (int i = 0; i < out.length; i++) {
            out[i] = kernels.dot(x, user * k, y, i * k, k) + itemBias[i];
        }
    }
}
