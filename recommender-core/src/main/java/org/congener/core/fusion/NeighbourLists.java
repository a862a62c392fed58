package org.congener.core.fusion;

import java.util.Arrays;

/**
 * The sparse form of an {@link ItemSimilarity}: for each item its most similar other items with their
 * similarities, best first. Similarities not listed count as 0. This is what a neighbour cache of
 * top-K similar compounds provides, and it makes the semantic score cost O(n_u·K) per researcher.
 */
public final class NeighbourLists {
    private final int[][] neighbours;
    private final double[][] similarities;

    /** Wraps the arrays (not copied); row i holds item i's neighbours and their similarities. */
    public NeighbourLists(int[][] neighbours, double[][] similarities) {
        if (neighbours.length != similarities.length) {
            throw new IllegalArgumentException("neighbour and similarity rows differ in number");
        }
        for (int i = 0; i < neighbours.length; i++) {
            if (neighbours[i].length != similarities[i].length) {
                throw new IllegalArgumentException("row " + i + ": lengths differ");
            }
        }
        this.neighbours = neighbours;
        this.similarities = similarities;
    }

    /** Top-{@code k} neighbours of every item by a dense similarity (O(n²), for small catalogues and tests). */
    public static NeighbourLists fromSimilarity(ItemSimilarity similarity, int itemCount, int k) {
        int[][] ids = new int[itemCount][];
        double[][] sims = new double[itemCount][];
        for (int i = 0; i < itemCount; i++) {
            Integer[] order = new Integer[itemCount - 1];
            double[] s = new double[itemCount];
            int n = 0;
            for (int j = 0; j < itemCount; j++) {
                if (j != i) {
                    s[j] = similarity.similarity(i, j);
                    order[n++] = j;
                }
            }
            Arrays.sort(order, (a, b) -> a.equals(b) ? 0 : s[b] != s[a] ? Double.compare(s[b], s[a]) : Integer.compare(a, b));
            int keep = 0;
            while (keep < Math.min(k, order.length) && s[order[keep]] > 0) {
                keep++;
            }
            ids[i] = new int[keep];
            sims[i] = new double[keep];
            for (int t = 0; t < keep; t++) {
                ids[i][t] = order[t];
                sims[i][t] = s[order[t]];
            }
        }
        return new NeighbourLists(ids, sims);
    }

    public int itemCount() {
        return neighbours.length;
    }

    public int[] neighbours(int item) {
        return neighbours[item];
    }

    public double[] similarities(int item) {
        return similarities[item];
    }

    /** The listed similarity of {@code b} to {@code a}, 0 if not listed. */
    public double similarity(int a, int b) {
        int[] row = neighbours[a];
        for (int t = 0; t < row.length; t++) {
            if (row[t] == b) {
                return similarities[a][t];
            }
        }
        return a == b ? 1.0 : 0.0;
    }
}
