package org.congener.core.fusion;

import java.util.Arrays;
import org.congener.core.interactions.SparseRows;
import org.congener.core.metrics.ScoreFunction;

/**
 * Fuses a CF score function and a semantic one per researcher (DESIGN.md, "Scoring"). CF scores can be
 * negative, so both are first min–max normalised to [0, 1] over the researcher's candidates (items
 * not in training):
 * <ul>
 *   <li>PRODUCT: cf̂ · (ε + sem)</li>
 *   <li>BLEND: w · cf̂ + (1 − w) · sem̂</li>
 *   <li>RANK_FUSION: 1/(k + rank_cf) + 1/(k + rank_sem), ranks from 1 (Cormack, Clarke &amp; Büttcher
 *       2009, "Reciprocal rank fusion outperforms Condorcet and individual rank learning methods", SIGIR)</li>
 *   <li>CF_ONLY, SEMANTIC_ONLY: one side alone</li>
 * </ul>
 * Training items get −∞ so they never enter a list.
 */
public final class FusedScorer implements ScoreFunction {
    private final ScoreFunction cf;
    private final ScoreFunction semantic;
    private final SparseRows training;
    private final FusionSettings settings;
    private final ThreadLocal<double[][]> scratch;

    public FusedScorer(ScoreFunction cf, ScoreFunction semantic, SparseRows trainingByUser, FusionSettings settings) {
        this.cf = cf;
        this.semantic = semantic;
        this.training = trainingByUser;
        this.settings = settings;
        int items = trainingByUser.columnCount();
        this.scratch = ThreadLocal.withInitial(() -> new double[][] {new double[items], new double[items]});
    }

    public FusionSettings settings() {
        return settings;
    }

    @Override
    public void scoreAll(int user, double[] out) {
        double[][] s = scratch.get();
        double[] c = s[0];
        double[] m = s[1];
        cf.scoreAll(user, c);
        semantic.scoreAll(user, m);
        maskTraining(user, c);
        maskTraining(user, m);
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
        maskTraining(user, out);
    }

    private void maskTraining(int user, double[] v) {
        for (int p = training.rowStart(user); p < training.rowEnd(user); p++) {
            v[training.column(p)] = Double.NEGATIVE_INFINITY;
        }
    }

    /** Min–max to [0, 1] over finite entries; −∞ (training items) stays. All equal → all 1. */
    static void normalise(double[] v) {
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
