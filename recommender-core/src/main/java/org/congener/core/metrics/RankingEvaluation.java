package org.congener.core.metrics;

import java.util.ArrayList;
import java.util.BitSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.atomic.AtomicInteger;
import org.congener.core.interactions.Interaction;
import org.congener.core.interactions.SparseRows;
import org.congener.core.split.Splitter;

/**
 * Scores every researcher that has held-out items, ranks the held-out items among the items the
 * researcher did not train on, and collects per-researcher metric values (the bootstrap then works on
 * these). Metric names: {@code precision@k}, {@code recall@k}, {@code f1@k}, {@code ndcg@k}, {@code
 * mrr}, {@code auc}, {@code auc@N}.
 */
public final class RankingEvaluation {
    private final int[] ks;
    private final int aucLimit;
    private final int threads;

    public RankingEvaluation(int[] ks, int aucLimit, int threads) {
        this.ks = ks.clone();
        this.aucLimit = aucLimit;
        this.threads = threads;
    }

    public int[] ks() {
        return ks.clone();
    }

    public int aucLimit() {
        return aucLimit;
    }

    /** Metric name → one value per evaluated researcher, researchers in ascending order. */
    public Map<String, double[]> perResearcher(SparseRows trainByUser, List<Interaction> test, ScoreFunction scorer) {
        List<int[]> cases = new ArrayList<>();
        for (Map.Entry<Integer, List<Interaction>> e : Splitter.byUser(test).entrySet()) {
            int u = e.getKey();
            int[] relevant = e.getValue().stream().mapToInt(Interaction::item)
                    .filter(i -> !trainByUser.contains(u, i)).distinct().toArray();
            if (relevant.length > 0) {
                int[] c = new int[relevant.length + 1];
                c[0] = u;
                System.arraycopy(relevant, 0, c, 1, relevant.length);
                cases.add(c);
            }
        }
        HeldOutRanks[] ranks = new HeldOutRanks[cases.size()];
        AtomicInteger next = new AtomicInteger();
        Runnable work = () -> {
            double[] scores = new double[trainByUser.columnCount()];
            BitSet training = new BitSet(scores.length);
            int n;
            while ((n = next.getAndIncrement()) < ranks.length) {
                int[] c = cases.get(n);
                int u = c[0];
                scorer.scoreAll(u, scores);
                training.clear();
                for (int p = trainByUser.rowStart(u); p < trainByUser.rowEnd(u); p++) {
                    training.set(trainByUser.column(p));
                }
                ranks[n] = HeldOutRanks.of(scores, training, java.util.Arrays.copyOfRange(c, 1, c.length));
            }
        };
        runOnThreads(work);
        Map<String, double[]> out = new LinkedHashMap<>();
        for (String name : metricNames()) {
            out.put(name, new double[ranks.length]);
        }
        for (int n = 0; n < ranks.length; n++) {
            HeldOutRanks r = ranks[n];
            for (int k : ks) {
                out.get("precision@" + k)[n] = r.precisionAtK(k);
                out.get("recall@" + k)[n] = r.recallAtK(k);
                out.get("f1@" + k)[n] = r.f1AtK(k);
                out.get("ndcg@" + k)[n] = r.ndcgAtK(k);
            }
            out.get("mrr")[n] = r.reciprocalRank();
            out.get("auc")[n] = r.auc();
            out.get("auc@" + aucLimit)[n] = r.aucAtN(aucLimit);
        }
        return out;
    }

    /** Means and bootstrap intervals of {@link #perResearcher}. */
    public Map<String, ConfidenceInterval> summarise(Map<String, double[]> perResearcher, int resamples, double level,
                                                     long seed) {
        Map<String, ConfidenceInterval> out = new LinkedHashMap<>();
        for (Map.Entry<String, double[]> e : perResearcher.entrySet()) {
            double[] finite = java.util.Arrays.stream(e.getValue()).filter(Double::isFinite).toArray();
            out.put(e.getKey(), Bootstrap.meanInterval(finite, resamples, level, seed));
        }
        return out;
    }

    public List<String> metricNames() {
        List<String> names = new ArrayList<>();
        for (String metric : List.of("precision", "recall", "f1", "ndcg")) {
            for (int k : ks) {
                names.add(metric + "@" + k);
            }
        }
        names.add("mrr");
        names.add("auc");
        names.add("auc@" + aucLimit);
        return names;
    }

    private void runOnThreads(Runnable work) {
        if (threads <= 1) {
            work.run();
            return;
        }
        java.util.concurrent.atomic.AtomicReference<Throwable> failure = new java.util.concurrent.atomic.AtomicReference<>();
        List<Thread> started = new ArrayList<>();
        for (int t = 0; t < threads; t++) {
            Thread thread = new Thread(() -> {
                try {
                    work.run();
                } catch (Throwable e) {
                    failure.compareAndSet(null, e);
                }
            }, "congener-evaluation");
            thread.start();
            started.add(thread);
        }
        for (Thread thread : started) {
            try {
                thread.join();
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                throw new IllegalStateException("interrupted", e);
            }
        }
        if (failure.get() != null) {
            throw new IllegalStateException("evaluation failed", failure.get());
        }
    }
}
