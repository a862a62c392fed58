package org.congener.core.factorisation;

import org.congener.core.interactions.SparseRows;

/**
 * The implicit-feedback objective of Hu, Koren &amp; Volinsky 2008, eq. (3):
 * <pre>
 *   L = Σ_{u,i} c_ui (p_ui − x_uᵀy_i)² + λ (Σ_u ‖x_u‖² + Σ_i ‖y_i‖²)
 * </pre>
 * summed over all n·m cells, and with Spark's weighting λ(Σ_u n_u‖x_u‖² + Σ_i n_i‖y_i‖²). Computed
 * without visiting every cell: Σ_{all} (x_uᵀy_i)² = Σ_u x_uᵀ(YᵀY)x_u, and each observed cell adds
 * c(1 − s)² − s² on top (s = x_uᵀy_i).
 */
public final class AlsObjective {
    private AlsObjective() {
    }

    public static double of(FactorMatrix x, FactorMatrix y, SparseRows byUser, SparseRows byItem, AlsConfig config) {
        DenseKernels kernels = DenseKernels.best();
        int k = config.rank();
        double[] gram;
        try (ParallelRows single = new ParallelRows(1)) {
            gram = Gram.of(y, single, kernels);
        }
        double[] xd = x.data();
        double[] yd = y.data();
        double[] gx = new double[k];
        double loss = 0.0;
        for (int u = 0; u < x.rows(); u++) {
            int off = u * k;
            for (int f = 0; f < k; f++) {
                gx[f] = kernels.dot(gram, f * k, xd, off, k);
            }
            loss += kernels.dot(xd, off, gx, 0, k);
            for (int p = byUser.rowStart(u); p < byUser.rowEnd(u); p++) {
                int i = byUser.column(p);
                double s = kernels.dot(xd, off, yd, i * k, k);
                double c = config.confidenceOf(byUser.value(p));
                loss += c * (1.0 - s) * (1.0 - s) - s * s;
            }
        }
        double penalty = 0.0;
        for (int u = 0; u < x.rows(); u++) {
            double w = config.regularisation().effectiveLambda(1.0, byUser.rowLength(u));
            penalty += w * kernels.dot(xd, u * k, xd, u * k, k);
        }
        for (int i = 0; i < y.rows(); i++) {
            double w = config.regularisation().effectiveLambda(1.0, byItem.rowLength(i));
            penalty += w * kernels.dot(yd, i * k, yd, i * k, k);
        }
        return loss + config.lambda() * penalty;
    }
}
