package org.congener.core.fusion;

import java.util.Arrays;
import org.congener.core.interactions.SparseRows;
import org.congener.core.metrics.ScoreFunction;

/** Baseline: every researcher gets the items with the most distinct researchers in training. */
public final class PopularityScorer implements ScoreFunction {
    private final double[] counts;

    public PopularityScorer(SparseRows byItem) {
        counts = new double[byItem.rowCount()];
        for (int i = 0; i < counts.length; i++) {
            counts[i] = byItem.rowLength(i);
        }
    }

    @Override
    public void scoreAll(int user, double[] out) {
        System.arraycopy(counts, 0, out, 0, counts.length);
    }

    public double[] counts() {
        return Arrays.copyOf(counts, counts.length);
    }
}
