package org.congener.core.interactions;

import java.util.Arrays;

/** Accumulates (user, item, strength) triples and sums repeated cells into an {@link InteractionMatrix}. */
public final class InteractionMatrixBuilder {
    private final int userCount;
    private final int itemCount;
    private int[] users = new int[1024];
    private int[] items = new int[1024];
    private double[] strengths = new double[1024];
    private int size;

    public InteractionMatrixBuilder(int userCount, int itemCount) {
        if (userCount < 0 || itemCount < 0) {
            throw new IllegalArgumentException("negative dimension");
        }
        this.userCount = userCount;
        this.itemCount = itemCount;
    }

    public InteractionMatrixBuilder add(int user, int item, double strength) {
        if (user < 0 || user >= userCount || item < 0 || item >= itemCount) {
            throw new IllegalArgumentException("cell (" + user + ", " + item + ") outside "
                    + userCount + " × " + itemCount);
        }
        if (!Double.isFinite(strength) || strength < 0) {
            throw new IllegalArgumentException("strength must be finite and non-negative: " + strength);
        }
        if (size == users.length) {
            int grown = size * 2;
            users = Arrays.copyOf(users, grown);
            items = Arrays.copyOf(items, grown);
            strengths = Arrays.copyOf(strengths, grown);
        }
        users[size] = user;
        items[size] = item;
        strengths[size] = strength;
        size++;
        return this;
    }

    public InteractionMatrix build() {
        int[] rowStart = new int[userCount + 1];
        for (int n = 0; n < size; n++) {
            rowStart[users[n] + 1]++;
        }
        for (int u = 0; u < userCount; u++) {
            rowStart[u + 1] += rowStart[u];
        }
        int[] next = rowStart.clone();
        int[] cols = new int[size];
        double[] vals = new double[size];
        for (int n = 0; n < size; n++) {
            int slot = next[users[n]]++;
            cols[slot] = items[n];
            vals[slot] = strengths[n];
        }
        // sort each row by column and merge repeated cells
        int[] outStart = new int[userCount + 1];
        int out = 0;
        Integer[] order = new Integer[0];
        for (int u = 0; u < userCount; u++) {
            int from = rowStart[u];
            int to = rowStart[u + 1];
            int len = to - from;
            if (order.length < len) {
                order = new Integer[len];
            }
            for (int p = 0; p < len; p++) {
                order[p] = from + p;
            }
            Arrays.sort(order, 0, len, (a, b) -> Integer.compare(cols[a], cols[b]));
            int[] rowCols = new int[len];
            double[] rowVals = new double[len];
            int m = 0;
            for (int p = 0; p < len; p++) {
                int c = cols[order[p]];
                if (m > 0 && rowCols[m - 1] == c) {
                    rowVals[m - 1] += vals[order[p]];
                } else {
                    rowCols[m] = c;
                    rowVals[m] = vals[order[p]];
                    m++;
                }
            }
            System.arraycopy(rowCols, 0, cols, out, m);
            System.arraycopy(rowVals, 0, vals, out, m);
            out += m;
            outStart[u + 1] = out;
        }
        return new InteractionMatrix(new SparseRows(userCount, itemCount, outStart,
                Arrays.copyOf(cols, out), Arrays.copyOf(vals, out)));
    }
}
