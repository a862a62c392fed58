package org.congener.core.fusion;

import org.congener.core.factorisation.DenseKernels;

/**
 * Fuses one researcher's CF and semantic scores into a preallocated array (DESIGN.md, "Scoring"). CF
 * scores can be negative, so both sides are first min–max normalised to [0, 1] over the researcher's
 * candidates (items not in training):
 * <ul>
 *   <li>PRODUCT: cf̂ · (ε + sem)</li>
 *   <li>BLEND: w · cf̂ + (1 − w) · sem̂</li>
 *   <li>RANK_FUSION: 1/(k + rank_cf) + 1/(k + rank_sem), ranks from 1, ties by item index (Cormack,
 *       Clarke &amp; Büttcher 2009, "Reciprocal rank fusion outperforms Condorcet and individual rank
 *       learning methods", SIGIR)</li>
 *   <li>CF_ONLY, SEMANTIC_ONLY: one side alone</li>
 * </ul>
 * Training items count as −∞ on both sides and get −∞, so they never enter a list. The inputs end
 * as they began (the range pass lends training items' entries for a moment and puts them back);
 * normalised values are formed where they are used, so no copy of either side is made. One instance serves one thread: it keeps the rank order's arrays, made on first use.
 */
final class ScoreFusion {
    private static final DenseKernels KERNELS = DenseKernels.best();

    private final int itemCount;
    /** Least and greatest from the kernel. */
    private final double[] runRange = new double[2];
    /** Training items' scores while candidates' stand in for them in {@link #range}. */
    private double[] saved = new double[16];
    private RankOrder rankOrder;
    /** 1/(k + r) for ranks r = 1..n at {@link #reciprocalK}: the same quotients, divided once per k. */
    private double[] reciprocalRank;
    private double reciprocalK = Double.NaN;
    private double lowest;
    private double span;
    /** Whether the last {@link #range} saw only finite candidates with a positive span. */
    private boolean plainScale;

    ScoreFusion(int itemCount) {
        this.itemCount = itemCount;
    }

    /**
     * Writes the fused score of every item into {@code out}. {@code training[from..to)} lists the
     * researcher's items in ascending order.
     */
    void fuse(FusionSettings settings, double[] cf, double[] semantic, int[] training, int from, int to, double[] out) {
        if (cf.length != itemCount || semantic.length != itemCount || out.length != itemCount) {
            throw new IllegalArgumentException("score arrays must have " + itemCount + " entries");
        }
        switch (settings.rule()) {
            case CF_ONLY -> System.arraycopy(cf, 0, out, 0, itemCount);
            case SEMANTIC_ONLY -> System.arraycopy(semantic, 0, out, 0, itemCount);
            case PRODUCT -> product(settings.epsilon(), cf, semantic, training, from, to, out);
            case BLEND -> blend(settings.weight(), cf, semantic, training, from, to, out);
            case RANK_FUSION -> rankFusion(settings.rrfK(), cf, semantic, training, from, to, out);
            default -> throw new IllegalStateException("unknown rule " + settings.rule());
        }
        for (int p = from; p < to; p++) {
            out[training[p]] = Double.NEGATIVE_INFINITY;
        }
    }

    private void product(double epsilon, double[] cf, double[] semantic, int[] training, int from, int to,
                         double[] out) {
        range(cf, training, from, to);
        double lo = lowest;
        double s = span;
        if (plainScale) {
            // the same quotients without the per-item tests, so the loop runs on vector lanes
            for (int i = 0; i < itemCount; i++) {
                out[i] = ((cf[i] - lo) / s) * (epsilon + semantic[i]);
            }
            return;
        }
        for (int i = 0; i < itemCount; i++) {
            out[i] = normalised(cf[i], lo, s) * (epsilon + semantic[i]);
        }
    }

    private void blend(double w, double[] cf, double[] semantic, int[] training, int from, int to, double[] out) {
        range(cf, training, from, to);
        double cfLo = lowest;
        double cfSpan = span;
        boolean cfPlain = plainScale;
        range(semantic, training, from, to);
        double semLo = lowest;
        double semSpan = span;
        if (cfPlain && plainScale) {
            // the same quotients without the per-item tests, so the loop runs on vector lanes
            for (int i = 0; i < itemCount; i++) {
                out[i] = w * ((cf[i] - cfLo) / cfSpan) + (1 - w) * ((semantic[i] - semLo) / semSpan);
            }
            return;
        }
        for (int i = 0; i < itemCount; i++) {
            out[i] = w * normalised(cf[i], cfLo, cfSpan) + (1 - w) * normalised(semantic[i], semLo, semSpan);
        }
    }

    private void rankFusion(double k, double[] cf, double[] semantic, int[] training, int from, int to,
                            double[] out) {
        if (rankOrder == null) {
            rankOrder = new RankOrder(itemCount);
            reciprocalRank = new double[itemCount];
        }
        if (Double.compare(k, reciprocalK) != 0) {
            for (int r = 0; r < itemCount; r++) {
                reciprocalRank[r] = 1.0 / (k + (r + 1));
            }
            reciprocalK = k;
        }
        int[] byCf = rankOrder.descending(cf, training, from, to);
        for (int r = 0; r < itemCount; r++) {
            out[byCf[r]] = reciprocalRank[r];
        }
        int[] bySemantic = rankOrder.descending(semantic, training, from, to);
        for (int r = 0; r < itemCount; r++) {
            out[bySemantic[r]] += reciprocalRank[r];
        }
    }

    /**
     * Lowest finite score and span (highest − lowest) over the candidates, i.e. skipping the sorted
     * training items; into {@link #lowest}, {@link #span} and {@link #plainScale}. One pass of the
     * vector kernel's min and max over the whole array, with each training item's score stood in for
     * by a candidate's while it runs (a repeated candidate value moves neither end) and put back
     * after, so the caller sees its array unchanged. When both ends come out finite every candidate was
     * finite, and Math.min and Math.max give the same answer in any order, so this is the scalar loop's
     * result; otherwise (a NaN or an infinity among the candidates, or no candidate) the scalar loop
     * decides.
     */
    private void range(double[] v, int[] training, int from, int to) {
        int stand = firstCandidate(training, from, to);
        if (stand < 0) {
            scalarRange(v, training, from, to);
            return;
        }
        if (saved.length < to - from) {
            saved = new double[Math.max(to - from, 2 * saved.length)];
        }
        double standIn = v[stand];
        for (int p = from; p < to; p++) {
            saved[p - from] = v[training[p]];
            v[training[p]] = standIn;
        }
        KERNELS.minMax(v, 0, itemCount, runRange);
        // backwards, so a repeated training item gets its first saved value, the original, last
        for (int p = to - 1; p >= from; p--) {
            v[training[p]] = saved[p - from];
        }
        double lo = runRange[0];
        double hi = runRange[1];
        if (Double.isFinite(lo) && Double.isFinite(hi)) {
            lowest = lo;
            span = hi - lo;
            plainScale = span > 0;
            return;
        }
        scalarRange(v, training, from, to);
    }

    /** The smallest item that is not a training item, or −1 when every item is one. */
    private int firstCandidate(int[] training, int from, int to) {
        int item = 0;
        for (int p = from; p < to && training[p] <= item; p++) {
            if (training[p] == item) {
                item++;
            }
        }
        return item < itemCount ? item : -1;
    }

    /** {@link #range} one item at a time, skipping non-finite scores. */
    private void scalarRange(double[] v, int[] training, int from, int to) {
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        boolean allFinite = true;
        int next = from;
        for (int i = 0; i < itemCount; i++) {
            if (next < to && training[next] == i) {
                while (next < to && training[next] == i) {
                    next++;
                }
                continue;
            }
            double x = v[i];
            if (Double.isFinite(x)) {
                lo = Math.min(lo, x);
                hi = Math.max(hi, x);
            } else {
                allFinite = false;
            }
        }
        lowest = lo;
        span = hi - lo;
        plainScale = allFinite && span > 0;
    }

    /** Min–max to [0, 1]; non-finite scores pass unchanged; all candidates equal → 1. */
    private static double normalised(double x, double lo, double span) {
        if (!Double.isFinite(x)) {
            return x;
        }
        return span > 0 ? (x - lo) / span : 1.0;
    }
}
