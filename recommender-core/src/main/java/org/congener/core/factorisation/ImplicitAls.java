package org.congener.core.factorisation;

import java.util.ArrayList;
import java.util.List;
import org.congener.core.interactions.InteractionMatrix;
import org.congener.core.interactions.SparseRows;

/**
 * Alternating least squares for implicit feedback (Hu, Koren &amp; Volinsky 2008): starting from random
 * item factors, each iteration solves every user row with Y fixed, then every item row with X fixed,
 * each row by {@link FoldIn}'s half-step. Rows are independent within a half-step, so the work is
 * spread over threads and the result is the same for any thread count.
 */
public final class ImplicitAls {
    private final AlsConfig config;
    private final DenseKernels kernels;

    public ImplicitAls(AlsConfig config) {
        this(config, DenseKernels.best());
    }

    public ImplicitAls(AlsConfig config, DenseKernels kernels) {
        this.config = config;
        this.kernels = kernels;
    }

    public AlsModel fit(InteractionMatrix matrix) {
        return fit(matrix, false, TrainingListener.NONE);
    }

    /** Trains; with {@code trackObjective} the objective is computed after every iteration. */
    public AlsModel fit(InteractionMatrix matrix, boolean trackObjective, TrainingListener listener) {
        int k = config.rank();
        FactorMatrix x = new FactorMatrix(matrix.userCount(), k);
        FactorMatrix y = FactorMatrix.random(matrix.itemCount(), k, config.seed());
        List<Double> history = new ArrayList<>();
        try (ParallelRows parallel = new ParallelRows(config.threads())) {
            for (int it = 0; it < config.iterations(); it++) {
                halfStep(matrix.byUser(), y, x, parallel);
                halfStep(matrix.byItem(), x, y, parallel);
                double objective = Double.NaN;
                if (trackObjective) {
                    objective = AlsObjective.of(x, y, matrix.byUser(), matrix.byItem(), config);
                    history.add(objective);
                }
                listener.iterationDone(it + 1, config.iterations(), objective);
            }
            return new AlsModel(x, new FixedFactors(y, Gram.of(y, parallel, kernels)), config, history);
        }
    }

    /**
     * One half-step: every row of {@code target} is solved against {@code fixed}; rows of {@code
     * rows} index {@code target}, its columns index {@code fixed}. Modifies {@code target}.
     */
    public void halfStep(SparseRows rows, FactorMatrix fixed, FactorMatrix target, ParallelRows parallel) {
        FixedFactors side = new FixedFactors(fixed, Gram.of(fixed, parallel, kernels));
        FoldIn solver = new FoldIn(side, config, kernels);
        int[] cols = rows.columnArray();
        double[] vals = rows.valueArray();
        double[] out = target.data();
        int k = config.rank();
        parallel.forEachRow(rows.rowCount(), solver::newWorkspace, (r, ws) -> {
            if (rows.rowLength(r) == 0) {
                // no data: the minimiser of λ‖x‖² + Σ_i (x·y_i)² is 0
                java.util.Arrays.fill(out, r * k, (r + 1) * k, 0.0);
                return;
            }
            solver.halfStep(cols, vals, rows.rowStart(r), rows.rowEnd(r), out, r * k, ws);
        });
    }

    /** Convenience for tests and the trainer: one user half-step on a copy of the model's users. */
    public FactorMatrix userHalfStep(AlsModel model, InteractionMatrix matrix) {
        FactorMatrix x = model.userFactors().copy();
        try (ParallelRows parallel = new ParallelRows(config.threads())) {
            halfStep(matrix.byUser(), model.itemFactors(), x, parallel);
        }
        return x;
    }
}
