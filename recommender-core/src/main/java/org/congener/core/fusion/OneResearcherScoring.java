package org.congener.core.fusion;

import java.util.function.IntPredicate;
import org.congener.core.factorisation.DenseKernels;
import org.congener.core.factorisation.FactorMatrix;
import org.congener.core.factorisation.FoldIn;

/**
 * The batch form of {@link ResearcherScoring}: the scores of every item for one researcher under one
 * model version, with an exact fold-in, in fresh arrays the caller keeps. It runs the same code as the
 * stream's per-thread workspace, so the two give the same lists from the same interactions and version.
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
        ResearcherScoring scoring = new ResearcherScoring(foldIn, itemFactors, neighbours, fusion);
        // a workspace of its own, so the arrays can be handed over rather than copied
        ScoringWorkspace ws = scoring.score(items, strengths, null, scoring.newWorkspace());
        return new Scores(ws.vector, ws.cf, ws.semantic, ws.fused);
    }

    private static final DenseKernels KERNELS = DenseKernels.best();

    /**
     * x·y_i for every item i: Y·x by the row-major product of the factorisation kernels
     * ({@link DenseKernels#multiply}). Its sums run in another order than the factor-major chains of
     * {@link ResearcherScoring}, so they agree with {@link Scores#cf} to rounding, not bit for bit.
     */
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
        int i = 0;
        // until the list is full, every finite (or +∞) entry the filter accepts goes in
        for (; i < fused.length && size < n; i++) {
            double s = fused[i];
            if (s == Double.NEGATIVE_INFINITY || Double.isNaN(s) || !eligible.test(i)) {
                continue;
            }
            size = insert(fused, best, size, n, i);
        }
        if (size < n) {
            return java.util.Arrays.copyOf(best, size);
        }
        // then only an entry above the last one listed can enter (NaN and −∞ never are), so the scan
        // skips ahead to the next such entry; the same items as testing each in turn
        double floor = n == 0 ? Double.POSITIVE_INFINITY : fused[best[n - 1]];
        for (i = KERNELS.firstAbove(fused, i, fused.length, floor); i < fused.length;
             i = KERNELS.firstAbove(fused, i + 1, fused.length, floor)) {
            if (eligible.test(i)) {
                insert(fused, best, size, n, i);
                floor = fused[best[n - 1]];
            }
        }
        return best;
    }

    /** Puts item i into best[0..size), best first, ties to the earlier; returns the new size (at most n). */
    private static int insert(double[] fused, int[] best, int size, int n, int i) {
        double s = fused[i];
        int grown = size < n ? size + 1 : size;
        int p = grown - 1;
        while (p > 0 && s > fused[best[p - 1]]) {
            best[p] = best[p - 1];
            p--;
        }
        best[p] = i;
        return grown;
    }
}
