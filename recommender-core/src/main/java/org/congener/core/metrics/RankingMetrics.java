package org.congener.core.metrics;

import java.util.BitSet;

/**
 * Metrics of one ranked list against the set of relevant (held-out) items. {@code ranking} lists
 * candidate item ids best first (training items already removed); {@code relevant} marks the held-out
 * items. Each metric cites the definition it implements.
 */
public final class RankingMetrics {
    private RankingMetrics() {
    }

    /** |relevant ∩ top k| / k (Manning, Raghavan &amp; Schütze 2008, Introduction to IR, section 8.4). */
    public static double precisionAtK(int[] ranking, BitSet relevant, int k) {
        return hitsAtK(ranking, relevant, k) / (double) k;
    }

    /** |relevant ∩ top k| / |relevant| (same source); 0 when nothing is relevant. */
    public static double recallAtK(int[] ranking, BitSet relevant, int k) {
        int total = relevant.cardinality();
        return total == 0 ? 0.0 : hitsAtK(ranking, relevant, k) / (double) total;
    }

    /** Harmonic mean of precision@k and recall@k (same source, eq. 8.5 with β = 1). */
    public static double f1AtK(int[] ranking, BitSet relevant, int k) {
        double p = precisionAtK(ranking, relevant, k);
        double r = recallAtK(ranking, relevant, k);
        return p + r == 0 ? 0.0 : 2 * p * r / (p + r);
    }

    public static int hitsAtK(int[] ranking, BitSet relevant, int k) {
        int hits = 0;
        for (int r = 0; r < Math.min(k, ranking.length); r++) {
            if (relevant.get(ranking[r])) {
                hits++;
            }
        }
        return hits;
    }

    /**
     * 1 / rank of the first relevant item, 0 when none is ranked (Voorhees 1999, TREC-8 question
     * answering track report); its mean over researchers is the MRR.
     */
    public static double reciprocalRank(int[] ranking, BitSet relevant) {
        for (int r = 0; r < ranking.length; r++) {
            if (relevant.get(ranking[r])) {
                return 1.0 / (r + 1);
            }
        }
        return 0.0;
    }

    /**
     * nDCG@k with binary gains: DCG = Σ_{r ≤ k} rel_r / log2(r + 1), divided by the DCG of an ideal
     * list (all relevant items first). Järvelin &amp; Kekäläinen 2002 with the log2(r + 1) discount
     * that scikit-learn's {@code ndcg_score} and most recommender evaluations use.
     */
    public static double ndcgAtK(int[] ranking, BitSet relevant, int k) {
        double dcg = 0;
        for (int r = 0; r < Math.min(k, ranking.length); r++) {
            if (relevant.get(ranking[r])) {
                dcg += 1.0 / log2(r + 2);
            }
        }
        double ideal = 0;
        int n = Math.min(k, relevant.cardinality());
        for (int r = 0; r < n; r++) {
            ideal += 1.0 / log2(r + 2);
        }
        return ideal == 0 ? 0.0 : dcg / ideal;
    }

    /**
     * Graded nDCG@k of {@code scores} against true relevance {@code gains}, linear gain and
     * log2(r + 1) discount, as scikit-learn's {@code ndcg_score} for one sample without ties.
     */
    public static double gradedNdcgAtK(double[] gains, double[] scores, int k) {
        Integer[] order = new Integer[scores.length];
        for (int t = 0; t < order.length; t++) {
            order[t] = t;
        }
        java.util.Arrays.sort(order, (a, b) -> Double.compare(scores[b], scores[a]));
        double[] ideal = gains.clone();
        java.util.Arrays.sort(ideal);
        double dcg = 0;
        double idcg = 0;
        for (int r = 0; r < Math.min(k, gains.length); r++) {
            dcg += gains[order[r]] / log2(r + 2);
            idcg += ideal[ideal.length - 1 - r] / log2(r + 2);
        }
        return idcg == 0 ? 0.0 : dcg / idcg;
    }

    /**
     * Cumulated DCG vector in Järvelin &amp; Kekäläinen's original form (2002, ACM TOIS 20(4), section
     * 2.2): DCG[i] = CG[i] for i &lt; b, DCG[i−1] + G[i]/log_b(i) for i ≥ b (ranks from 1).
     */
    public static double[] jarvelinKekalainenDcg(double[] gains, double base) {
        double[] out = new double[gains.length];
        double sum = 0;
        for (int i = 1; i <= gains.length; i++) {
            double g = gains[i - 1];
            sum += i < base ? g : g / (Math.log(i) / Math.log(base));
            out[i - 1] = sum;
        }
        return out;
    }

    /**
     * AUC of one ranked list: the fraction of (relevant, non-relevant) pairs in which the relevant item
     * is ranked higher (the Mann–Whitney reading of the ROC area, Hanley &amp; McNeil 1982). Candidates
     * are all items in {@code ranking}; NaN when either class is empty.
     */
    public static double auc(int[] ranking, BitSet relevant) {
        return aucAtN(ranking, relevant, Integer.MAX_VALUE);
    }

    /**
     * AUC limited to the first N non-relevant items of the ranking: the partial area under the ROC
     * curve for false-positive rate in [0, N'/|neg|], N' = min(N, |neg|), divided by its width N'/|neg|
     * so that 1 is perfect (McClish 1989, "Analyzing a portion of the ROC curve", Medical Decision Making
     * 9:190–195, the unstandardised partial AUC scaled to [0, 1]). In pair form: the fraction of pairs
     * (relevant p, one of the first N' non-relevant q) with p ranked above q. N ≥ |neg| gives the AUC.
     */
    public static double aucAtN(int[] ranking, BitSet relevant, int n) {
        int positives = 0;
        for (int item : ranking) {
            if (relevant.get(item)) {
                positives++;
            }
        }
        int negatives = ranking.length - positives;
        if (positives == 0 || negatives == 0) {
            return Double.NaN;
        }
        int limit = Math.min(n, negatives);
        long correct = 0;
        int positivesSeen = 0;
        int negativesSeen = 0;
        for (int r = 0; r < ranking.length && negativesSeen < limit; r++) {
            if (relevant.get(ranking[r])) {
                positivesSeen++;
            } else {
                // every relevant item above this negative is a correctly ordered pair
                correct += positivesSeen;
                negativesSeen++;
            }
        }
        return correct / ((double) positives * limit);
    }

    /**
     * AUC from scores and labels with ties counted one half (Hanley &amp; McNeil 1982, Radiology
     * 143:29–36, eq. 1, the Wilcoxon statistic), as scikit-learn's {@code roc_auc_score}.
     */
    public static double aucOfScores(double[] scores, boolean[] positive) {
        double correct = 0;
        long pos = 0;
        long neg = 0;
        for (int a = 0; a < scores.length; a++) {
            if (positive[a]) {
                pos++;
            } else {
                neg++;
            }
        }
        for (int a = 0; a < scores.length; a++) {
            if (!positive[a]) {
                continue;
            }
            for (int b = 0; b < scores.length; b++) {
                if (positive[b]) {
                    continue;
                }
                if (scores[a] > scores[b]) {
                    correct += 1;
                } else if (scores[a] == scores[b]) {
                    correct += 0.5;
                }
            }
        }
        return correct / (pos * (double) neg);
    }

    /** Standard error of an AUC θ, Hanley &amp; McNeil 1982, eq. (2) with Q1 = θ/(2−θ), Q2 = 2θ²/(1+θ). */
    public static double hanleyMcNeilStandardError(double auc, long positives, long negatives) {
        double q1 = auc / (2 - auc);
        double q2 = 2 * auc * auc / (1 + auc);
        double variance = (auc * (1 - auc) + (positives - 1) * (q1 - auc * auc)
                + (negatives - 1) * (q2 - auc * auc)) / (positives * (double) negatives);
        return Math.sqrt(variance);
    }

    private static double log2(double v) {
        return Math.log(v) / Math.log(2);
    }
}
