package org.congener.core.fusion;

import java.util.function.IntPredicate;
import org.congener.core.factorisation.DenseKernels;
import org.congener.core.factorisation.FactorMatrix;
import org.congener.core.factorisation.FoldIn;
import org.congener.core.interactions.SparseRows;

/**
 * The scores of every item for one researcher under one model version: exact fold-in of the
 * researcher's vector, CF score x·y_i, mean semantic score over the neighbour lists, and the fusion rule
 * of {@link FusedScorer}. The streams app (per event) and a batch top-N (per researcher) both call this,
 * so the two give the same lists from the same interactions and version.
 */
public final class OneResearcherScoring {

    /**
     * Scores of one researcher; {@code fused} is −∞ on the researcher's own items.
     *
     * @param vector the folded-in factors x_u
     */
    public record Scores(double[] vector, double[] cf, double[] semantic, double[] fused) {
    }

    private OneResearcherScoring() {
    }

    /**
     * @param items     indices of the compounds the researcher interacted with (distinct)
     * @param strengths r_ui of each
     */
    public static Scores score(FoldIn foldIn, FactorMatrix itemFactors, NeighbourLists neighbours,
                               FusionSettings fusion, int[] items, double[] strengths) {
        int n = itemFactors.rows();
        if (neighbours.itemCount() != n) {
            throw new IllegalArgumentException("neighbour lists cover " + neighbours.itemCount() + " items, factors " + n);
        }
        double[] x = items.length == 0 ? new double[itemFactors.rank()] : foldIn.foldInUser(items, strengths);
        int[] order = sortedOrder(items);
        int[] cols = new int[items.length];
        double[] vals = new double[items.length];
        for (int p = 0; p < order.length; p++) {
            cols[p] = items[order[p]];
            vals[p] = strengths[order[p]];
        }
        SparseRows row = new SparseRows(1, n, new int[] {0, items.length}, cols, vals);
        double[] cf = new double[n];
        cfScores(x, itemFactors, cf);
        double[] semantic = new double[n];
        SemanticScorer semanticScorer = new SemanticScorer(row, neighbours, SemanticAggregation.MEAN);
        semanticScorer.scoreAll(0, semantic);
        double[] fused = new double[n];
        new FusedScorer((u, out) -> System.arraycopy(cf, 0, out, 0, n), semanticScorer, row, fusion).scoreAll(0, fused);
        return new Scores(x, cf, semantic, fused);
    }

    private static final DenseKernels KERNELS = DenseKernels.best();

    /** x·y_i for every item i: Y·x by the blocked matrix–vector product of the factorisation kernels. */
    public static void cfScores(double[] x, FactorMatrix itemFactors, double[] out) {
        KERNELS.multiply(itemFactors.data(), 0, out.length, itemFactors.rank(), x, 0, out, 0);
    }

    /**
     * The best {@code n} items by {@code fused} that {@code eligible} accepts, best first; ties go to the
     * smaller index; −∞ never enters.
     */
    public static int[] topN(double[] fused, int n, IntPredicate eligible) {
        int[] best = new int[n];
        int size = 0;
        for (int i = 0; i < fused.length; i++) {
            double s = fused[i];
            if (s == Double.NEGATIVE_INFINITY || Double.isNaN(s)) {
                continue;
            }
            if (size == n && !(s > fused[best[size - 1]])) {
                continue;
            }
            if (!eligible.test(i)) {
                continue;
            }
            int p = size < n ? size++ : size - 1;
            while (p > 0 && s > fused[best[p - 1]]) {
                best[p] = best[p - 1];
                p--;
            }
            best[p] = i;
        }
        return java.util.Arrays.copyOf(best, size);
    }

    private static int[] sortedOrder(int[] items) {
        Integer[] order = new Integer[items.length];
        for (int i = 0; i < items.length; i++) {
            order[i] = i;
        }
        java.util.Arrays.sort(order, (a, b) -> Integer.compare(items[a], items[b]));
        int[] out = new int[items.length];
        for (int i = 0; i < items.length; i++) {
            out[i] = order[i];
        }
        return out;
    }
}
