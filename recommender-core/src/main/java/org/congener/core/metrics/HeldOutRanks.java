package org.congener.core.metrics;

import java.util.Arrays;

/**
 * Where one researcher's held-out items landed: their 1-based ranks, ascending, among {@code
 * candidates} items (all items minus the researcher's training items). A candidate ranks above a
 * held-out item when it scores strictly higher, or equally with a smaller item index. All metrics of
 * {@link RankingMetrics} follow from these ranks without sorting the whole list.
 */
public record HeldOutRanks(int[] ranks, int candidates) {

    public HeldOutRanks {
        ranks = ranks.clone();
        Arrays.sort(ranks);
    }

    /** Ranks held-out {@code relevant} items given all scores and which items are training items. */
    public static HeldOutRanks of(double[] scores, java.util.BitSet training, int[] relevant) {
        int candidates = scores.length - training.cardinality();
        int[] ranks = new int[relevant.length];
        for (int t = 0; t < relevant.length; t++) {
            int p = relevant[t];
            double sp = scores[p];
            int above = 0;
            for (int c = 0; c < scores.length; c++) {
                if (c != p && !training.get(c) && (scores[c] > sp || (scores[c] == sp && c < p))) {
                    above++;
                }
            }
            ranks[t] = above + 1;
        }
        return new HeldOutRanks(ranks, candidates);
    }

    public int hitsAtK(int k) {
        int hits = 0;
        for (int r : ranks) {
            if (r <= k) {
                hits++;
            }
        }
        return hits;
    }

    public double precisionAtK(int k) {
        return hitsAtK(k) / (double) k;
    }

    public double recallAtK(int k) {
        return ranks.length == 0 ? 0.0 : hitsAtK(k) / (double) ranks.length;
    }

    public double f1AtK(int k) {
        double p = precisionAtK(k);
        double r = recallAtK(k);
        return p + r == 0 ? 0.0 : 2 * p * r / (p + r);
    }

    public double reciprocalRank() {
        return ranks.length == 0 ? 0.0 : 1.0 / ranks[0];
    }

    public double ndcgAtK(int k) {
        double dcg = 0;
        for (int r : ranks) {
            if (r <= k) {
                dcg += 1.0 / (Math.log(r + 1) / Math.log(2));
            }
        }
        double ideal = 0;
        for (int r = 1; r <= Math.min(k, ranks.length); r++) {
            ideal += 1.0 / (Math.log(r + 1) / Math.log(2));
        }
        return ideal == 0 ? 0.0 : dcg / ideal;
    }

    /** As {@link RankingMetrics#aucAtN}: with ranks r_j ascending, r_j − j negatives stand above the j-th. */
    public double aucAtN(int n) {
        int positives = ranks.length;
        int negatives = candidates - positives;
        if (positives == 0 || negatives <= 0) {
            return Double.NaN;
        }
        int limit = Math.min(n, negatives);
        long correct = 0;
        for (int j = 0; j < positives; j++) {
            int negativesAbove = ranks[j] - 1 - j;
            correct += Math.max(0, limit - negativesAbove);
        }
        return correct / ((double) positives * limit);
    }

    public double auc() {
        return aucAtN(Integer.MAX_VALUE);
    }
}
