package org.congener.core.fusion;

import java.util.Arrays;
import org.congener.core.interactions.SparseRows;
import org.congener.core.metrics.ScoreFunction;

/**
 * semantic(u, i) from the researcher's training items I_u and item neighbour lists (see
 * {@link SemanticAggregation}); each j spreads its similarity to its listed neighbours, so the cost is
 * O(n_u·K). An item j ∈ I_u also counts as similar 1 to itself.
 */
public final class SemanticScorer implements ScoreFunction {
    private final SparseRows byUser;
    private final NeighbourLists neighbours;
    private final SemanticAggregation aggregation;

    public SemanticScorer(SparseRows byUser, NeighbourLists neighbours, SemanticAggregation aggregation) {
        if (neighbours.itemCount() != byUser.columnCount()) {
            throw new IllegalArgumentException("neighbour lists cover " + neighbours.itemCount()
                    + " items, the matrix " + byUser.columnCount());
        }
        this.byUser = byUser;
        this.neighbours = neighbours;
        this.aggregation = aggregation;
    }

    @Override
    public void scoreAll(int user, double[] out) {
        Arrays.fill(out, 0.0);
        int from = byUser.rowStart(user);
        int to = byUser.rowEnd(user);
        if (from == to) {
            return;
        }
        double totalWeight = 0;
        for (int p = from; p < to; p++) {
            int j = byUser.column(p);
            double w = aggregation == SemanticAggregation.WEIGHTED ? byUser.value(p) : 1.0;
            totalWeight += w;
            spread(out, j, 1.0, w);
            int[] ids = neighbours.neighbours(j);
            double[] sims = neighbours.similarities(j);
            for (int t = 0; t < ids.length; t++) {
                spread(out, ids[t], sims[t], w);
            }
        }
        if (aggregation != SemanticAggregation.BEST_MATCH && totalWeight > 0) {
            for (int i = 0; i < out.length; i++) {
                out[i] /= totalWeight;
            }
        }
    }

    private void spread(double[] out, int item, double similarity, double weight) {
        if (aggregation == SemanticAggregation.BEST_MATCH) {
            out[item] = Math.max(out[item], similarity);
        } else {
            out[item] += weight * similarity;
        }
    }
}
