package org.congener.core.fusion;

import java.util.Arrays;
import org.congener.core.factorisation.FactorMatrix;
import org.congener.core.factorisation.FoldIn;

/**
 * The reference the workspace is checked against: {@code OneResearcherScoring.score} and the fusion
 * of {@code FusedScorer} as they were at commit 306a727, before the workspace — allocating, one product
 * per compound, boxed sorts — kept here line for line so the new code is compared with the old
 * arithmetic and not with itself. One change since: each CF score is the sequential chain of fused
 * multiply-adds over the factors in order ({@link #cf}), the sum the factor-major product computes,
 * where it was the row dot product of the kernels.
 */
final class ScoringAsBefore {
    private ScoringAsBefore() {
    }

    static OneResearcherScoring.Scores score(FoldIn foldIn, FactorMatrix itemFactors, NeighbourLists neighbours,
                                             FusionSettings fusion, int[] items, double[] strengths) {
        int n = itemFactors.rows();
        int k = itemFactors.rank();
        double[] x = items.length == 0 ? new double[k] : foldIn.foldInUser(items, strengths);
        int[] sorted = items.clone();
        Arrays.sort(sorted);
        double[] cf = new double[n];
        for (int i = 0; i < n; i++) {
            cf[i] = cf(x, itemFactors, i, k);
        }
        double[] semantic = meanSemantic(sorted, neighbours, n);
        double[] fused = fuse(fusion, cf.clone(), semantic.clone(), sorted);
        return new OneResearcherScoring.Scores(x, cf, semantic, fused);
    }

    /** x·y_i as s ← fma(y_it, x_t, s) for t = 0 … k−1 from 0.0, one rounding per factor. */
    static double cf(double[] x, FactorMatrix itemFactors, int item, int k) {
        double s = 0.0;
        for (int t = 0; t < k; t++) {
            s = Math.fma(itemFactors.get(item, t), x[t], s);
        }
        return s;
    }

    /** SemanticScorer with SemanticAggregation.MEAN over the researcher's items in ascending order. */
    private static double[] meanSemantic(int[] sortedItems, NeighbourLists neighbours, int n) {
        double[] out = new double[n];
        if (sortedItems.length == 0) {
            return out;
        }
        double totalWeight = 0;
        for (int j : sortedItems) {
            totalWeight += 1.0;
            out[j] += 1.0 * 1.0;
            int[] ids = neighbours.neighbours(j);
            double[] sims = neighbours.similarities(j);
            for (int t = 0; t < ids.length; t++) {
                out[ids[t]] += 1.0 * sims[t];
            }
        }
        for (int i = 0; i < n; i++) {
            out[i] /= totalWeight;
        }
        return out;
    }

    /** FusedScorer.scoreAll: c and m are copies, masked and normalised in place. */
    static double[] fuse(FusionSettings settings, double[] c, double[] m, int[] training) {
        double[] out = new double[c.length];
        mask(c, training);
        mask(m, training);
        switch (settings.rule()) {
            case CF_ONLY -> System.arraycopy(c, 0, out, 0, out.length);
            case SEMANTIC_ONLY -> System.arraycopy(m, 0, out, 0, out.length);
            case PRODUCT -> {
                normalise(c);
                for (int i = 0; i < out.length; i++) {
                    out[i] = c[i] * (settings.epsilon() + m[i]);
                }
            }
            case BLEND -> {
                normalise(c);
                normalise(m);
                double w = settings.weight();
                for (int i = 0; i < out.length; i++) {
                    out[i] = w * c[i] + (1 - w) * m[i];
                }
            }
            case RANK_FUSION -> {
                int[] rc = ranks(c);
                int[] rm = ranks(m);
                for (int i = 0; i < out.length; i++) {
                    out[i] = 1.0 / (settings.rrfK() + rc[i]) + 1.0 / (settings.rrfK() + rm[i]);
                }
            }
            default -> throw new IllegalStateException("unknown rule " + settings.rule());
        }
        mask(out, training);
        return out;
    }

    private static void mask(double[] v, int[] training) {
        for (int i : training) {
            v[i] = Double.NEGATIVE_INFINITY;
        }
    }

    private static void normalise(double[] v) {
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (double x : v) {
            if (Double.isFinite(x)) {
                lo = Math.min(lo, x);
                hi = Math.max(hi, x);
            }
        }
        double span = hi - lo;
        for (int i = 0; i < v.length; i++) {
            if (Double.isFinite(v[i])) {
                v[i] = span > 0 ? (v[i] - lo) / span : 1.0;
            }
        }
    }

    /** 1-based ranks, ties broken by item index. */
    static int[] ranks(double[] v) {
        Integer[] order = new Integer[v.length];
        for (int i = 0; i < v.length; i++) {
            order[i] = i;
        }
        Arrays.sort(order, (a, b) -> v[a] != v[b] ? Double.compare(v[b], v[a]) : Integer.compare(a, b));
        int[] rank = new int[v.length];
        for (int r = 0; r < order.length; r++) {
            rank[order[r]] = r + 1;
        }
        return rank;
    }
}
