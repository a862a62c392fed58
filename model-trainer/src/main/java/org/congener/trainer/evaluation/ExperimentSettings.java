package org.congener.trainer.evaluation;

import java.util.List;
import org.congener.core.split.Splitter;

/**
 * What the offline experiment does. The grids are small on purpose (the issue asks for a small grid);
 * the selection metric is computed on a validation split cut from the training part by the same splitter.
 *
 * @param splitter       held-out split of the whole log (and, again, of the training part for validation)
 * @param ks             cut-offs for the @k metrics
 * @param aucLimit       N of AUC limited to the first N non-relevant items
 * @param selectMetric   metric name chosen on validation, e.g. {@code ndcg@10}
 * @param ranks          ALS and BPR rank grid
 * @param lambdas        ALS λ grid
 * @param alphas         ALS α grid
 * @param blendWeights   grid of w in the linear blend
 * @param rrfKs          grid of k in reciprocal-rank fusion
 * @param iterations     ALS iterations
 * @param bprEpochs      BPR epochs
 * @param neighbours     K of the semantic neighbour lists
 * @param resamples      bootstrap resamples
 * @param level          confidence level of the intervals
 * @param seed           seed of models and bootstrap
 * @param threads        worker threads
 */
public record ExperimentSettings(Splitter splitter, int[] ks, int aucLimit, String selectMetric, List<Integer> ranks,
                                 List<Double> lambdas, List<Double> alphas, List<Double> blendWeights,
                                 List<Double> rrfKs, int iterations, int bprEpochs, int neighbours, int resamples,
                                 double level, long seed, int threads) {

    public static ExperimentSettings defaults(Splitter splitter, int[] ks) {
        return new ExperimentSettings(splitter, ks, 100, "ndcg@" + closestTo10(ks), List.of(16, 32),
                List.of(0.05, 0.5), List.of(5.0, 20.0), List.of(0.3, 0.5, 0.7, 0.9), List.of(10.0, 60.0), 10, 40,
                50, 1000, 0.95, 42L, Math.max(1, Runtime.getRuntime().availableProcessors()));
    }

    private static int closestTo10(int[] ks) {
        int best = ks[0];
        for (int k : ks) {
            if (Math.abs(k - 10) < Math.abs(best - 10)) {
                best = k;
            }
        }
        return best;
    }

    public ExperimentSettings withIterations(int v) {
        return new ExperimentSettings(splitter, ks, aucLimit, selectMetric, ranks, lambdas, alphas, blendWeights, rrfKs,
                v, bprEpochs, neighbours, resamples, level, seed, threads);
    }

    public ExperimentSettings withThreads(int v) {
        return new ExperimentSettings(splitter, ks, aucLimit, selectMetric, ranks, lambdas, alphas, blendWeights, rrfKs,
                iterations, bprEpochs, neighbours, resamples, level, seed, v);
    }

    public ExperimentSettings withSeed(long v) {
        return new ExperimentSettings(splitter, ks, aucLimit, selectMetric, ranks, lambdas, alphas, blendWeights, rrfKs,
                iterations, bprEpochs, neighbours, resamples, level, v, threads);
    }

    public ExperimentSettings withGrid(List<Integer> r, List<Double> l, List<Double> a) {
        return new ExperimentSettings(splitter, ks, aucLimit, selectMetric, r, l, a, blendWeights, rrfKs,
                iterations, bprEpochs, neighbours, resamples, level, seed, threads);
    }
}
