package org.congener.core.factorisation;

import java.util.List;

/**
 * A fitted ALS model: user factors X, item factors Y (with YᵀY for fold-in), the settings, and the
 * objective after each iteration (empty when it was not tracked).
 */
public record AlsModel(FactorMatrix userFactors, FixedFactors items, AlsConfig config, List<Double> objectiveHistory) {

    public AlsModel {
        objectiveHistory = List.copyOf(objectiveHistory);
    }

    public FactorMatrix itemFactors() {
        return items.factors();
    }

    /** x_u · y_i. */
    public double score(int user, int item) {
        return FactorMatrix.dot(userFactors, user, items.factors(), item);
    }

    /** Scores of every item for one user, written into {@code out} (length = item count). */
    public void scoreAll(int user, double[] out) {
        DenseKernels kernels = DenseKernels.best();
        int k = config.rank();
        double[] x = userFactors.data();
        double[] y = items.factors().data();
        int xOff = user * k;
        for (int i = 0; i < out.length; i++) {
            out[i] = kernels.dot(x, xOff, y, i * k, k);
        }
    }

    /** A fold-in bound to this model's items, for researchers that were not trained. */
    public FoldIn foldIn() {
        return new FoldIn(items, config);
    }
}
