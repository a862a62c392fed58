package org.congener.core.fusion;

import java.util.function.IntPredicate;
import org.congener.core.factorisation.FoldIn;

/**
 * The arrays one thread scores researchers into, sized for a catalogue of {@code itemCount} items and
 * factors of rank k, reused from call to call so that scoring allocates nothing in proportion to the
 * catalogue. After {@link ResearcherScoring#score} it holds that researcher's x_u, CF, semantic and fused
 * scores until the next call; outside this package it is read only. Not thread-safe: one per thread.
 */
public final class ScoringWorkspace {
    final double[] vector;
    /** Not final: a batch column's scores are exchanged in ({@link ResearcherScoring#scoreColumn}). */
    double[] cf;
    final double[] semantic;
    final double[] fused;
    final ScoreFusion fusion;
    final FoldIn.Workspace foldIn;
    /** The researcher's items ascending with their strengths, grown when a longer history comes. */
    int[] sortedItems = new int[16];
    double[] sortedStrengths = new double[16];
    long[] itemAndPosition = new long[16];
    int researcherItems;
    int foldInSteps;

    public ScoringWorkspace(int itemCount, int rank) {
        if (itemCount < 0 || rank < 1) {
            throw new IllegalArgumentException("workspace needs itemCount >= 0 and rank >= 1: " + itemCount + ", " + rank);
        }
        vector = new double[rank];
        cf = new double[itemCount];
        semantic = new double[itemCount];
        fused = new double[itemCount];
        fusion = new ScoreFusion(itemCount);
        foldIn = new FoldIn.Workspace(rank);
    }

    public int itemCount() {
        return cf.length;
    }

    public int rank() {
        return vector.length;
    }

    /** True when this workspace can score under a model of this catalogue size and rank. */
    public boolean fits(int itemCount, int rank) {
        return itemCount == itemCount() && rank == rank();
    }

    /** Factor f of the researcher's folded-in vector x_u. */
    public double vector(int f) {
        return vector[f];
    }

    /** Copies x_u into {@code into[0..k)} (e.g. to keep it as the next event's warm start). */
    public void copyVector(double[] into) {
        if (into.length != vector.length) {
            throw new IllegalArgumentException("vector has " + vector.length + " entries, not " + into.length);
        }
        System.arraycopy(vector, 0, into, 0, vector.length);
    }

    /** x_u·y_i. */
    public double cf(int item) {
        return cf[item];
    }

    /** Mean similarity of item i to the researcher's items over the neighbour lists. */
    public double semantic(int item) {
        return semantic[item];
    }

    /** The fusion rule's score; −∞ on the researcher's own items. */
    public double fused(int item) {
        return fused[item];
    }

    /** How many items the last scored researcher had (n_u). */
    public int researcherItems() {
        return researcherItems;
    }

    /** CG steps of the fold-in; 0 when it was exact (no warm start) or the researcher has no items. */
    public int foldInSteps() {
        return foldInSteps;
    }

    /** The best {@code n} items by fused score that {@code eligible} accepts, as {@link OneResearcherScoring#topN}. */
    public int[] topN(int n, IntPredicate eligible) {
        return OneResearcherScoring.topN(fused, n, eligible);
    }

    /** Sorted copies of the researcher's items and strengths, by item; checks each item is in range. */
    void sortItems(int[] items, double[] strengths) {
        int n = items.length;
        if (sortedItems.length < n) {
            int capacity = Math.max(n, 2 * sortedItems.length);
            sortedItems = new int[capacity];
            sortedStrengths = new double[capacity];
            itemAndPosition = new long[capacity];
        }
        boolean ascending = true;
        for (int p = 0; p < n; p++) {
            int item = items[p];
            if (item < 0 || item >= itemCount()) {
                throw new IllegalArgumentException("item " + item + " is outside 0.." + (itemCount() - 1));
            }
            ascending &= p == 0 || items[p - 1] < item;
        }
        // a caller that keeps its items in order (the stream's rows, fold-in and scoring alike) is not sorted again
        if (ascending) {
            System.arraycopy(items, 0, sortedItems, 0, n);
            System.arraycopy(strengths, 0, sortedStrengths, 0, n);
        } else {
            for (int p = 0; p < n; p++) {
                itemAndPosition[p] = ((long) items[p] << 32) | p;
            }
            java.util.Arrays.sort(itemAndPosition, 0, n);
            for (int p = 0; p < n; p++) {
                int from = (int) itemAndPosition[p];
                sortedItems[p] = items[from];
                sortedStrengths[p] = strengths[from];
            }
        }
        researcherItems = n;
    }
}
