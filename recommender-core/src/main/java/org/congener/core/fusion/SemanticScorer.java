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
        scoreInto(byUser.columnArray(), byUser.valueArray(), byUser.rowStart(user), byUser.rowEnd(user), neighbours,
                aggregation, out);
    }

    /**
     * The semantic score of every item for the researcher whose items and strengths are
     * {@code items/strengths[from..to)}; overwrites {@code out} (one entry per item). The stream's
     * workspace and the batch scorer share this, so the two cannot differ.
     */
    static void scoreInto(int[] items, double[] strengths, int from, int to, NeighbourLists neighbours,
                          SemanticAggregation aggregation, double[] out) {
        Arrays.fill(out, 0.0);
        if (from == to) {
            return;
        }
        double totalWeight = 0;
        for (int p = from; p < to; p++) {
            int j = items[p];
            double w = aggregation == SemanticAggregation.WEIGHTED ? strengths[p] : 1.0;
            totalWeight += w;
            spread(aggregation, out, j, 1.0, w);
            int[] ids = neighbours.neighbours(j);
            double[] sims = neighbours.similarities(j);
            for (int t = 0; t < ids.length; t++) {
                spread(aggregation, out, ids[t], sims[t], w);
            }
        }
        if (aggregation != SemanticAggregation.BEST_MATCH && totalWeight > 0) {
            for (int i = 0; i < out.length; i++) {
                out[i] /= totalWeight;
            }
        }
    }

    private static void spread(SemanticAggregation aggregation, double[] out, int item, double similarity,
                               double weight) {
        if (aggregation == SemanticAggregation.BEST_MATCH) {
            out[item] = Math.max(out[item], similarity);
        } else {
            out[item] += weight * similarity;
        }
    }
}
