package org.congener.core.fusion;

import org.congener.core.factorisation.FactorMatrix;

/**
 * Factors for items without interactions (new to the catalogue), estimated from their ontology
 * neighbours that have some (DESIGN.md, "Scoring"): y_i = Σ_j sim(i, j)·y_j / Σ_j sim(i, j) over listed
 * neighbours j with at least one interaction — a similarity-weighted mean, common practice for item
 * cold start. Items with no such neighbour keep a zero row (scored by semantics alone).
 */
public final class NeighbourFactorEstimate {
    private NeighbourFactorEstimate() {
    }

    /**
     * Returns a copy of {@code items} in which every row with {@code interactionCount[i] == 0} is replaced
     * by the estimate; rows with interactions are unchanged.
     */
    public static FactorMatrix fillColdItems(FactorMatrix items, int[] interactionCount, NeighbourLists neighbours) {
        if (interactionCount.length != items.rows() || neighbours.itemCount() != items.rows()) {
            throw new IllegalArgumentException("item counts differ: " + items.rows() + ", " + interactionCount.length
                    + ", " + neighbours.itemCount());
        }
        FactorMatrix out = items.copy();
        int k = items.rank();
        double[] src = items.data();
        double[] dst = out.data();
        for (int i = 0; i < items.rows(); i++) {
            if (interactionCount[i] > 0) {
                continue;
            }
            double total = 0;
            double[] sum = new double[k];
            int[] ids = neighbours.neighbours(i);
            double[] sims = neighbours.similarities(i);
            for (int t = 0; t < ids.length; t++) {
                if (interactionCount[ids[t]] == 0 || sims[t] <= 0) {
                    continue;
                }
                total += sims[t];
                for (int f = 0; f < k; f++) {
                    sum[f] += sims[t] * src[ids[t] * k + f];
                }
            }
            for (int f = 0; f < k; f++) {
                dst[i * k + f] = total > 0 ? sum[f] / total : 0.0;
            }
        }
        return out;
    }
}
