package org.congener.bench.factorisation;

import java.util.SplittableRandom;
import java.util.concurrent.TimeUnit;
import org.congener.core.factorisation.AlsConfig;
import org.congener.core.factorisation.FactorMatrix;
import org.congener.core.factorisation.FixedFactors;
import org.congener.core.factorisation.FoldIn;
import org.congener.core.fusion.FusionSettings;
import org.congener.core.fusion.NeighbourLists;
import org.congener.core.fusion.OneResearcherScoring;
import org.congener.schemas.FusionRule;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * The work of one usage event in the stream: fold-in of one researcher with n_u = 20 past compounds,
 * CF scores over I = 10,000 compounds at k = 64, the mean semantic score over K = 20 neighbours per
 * compound, the fusion rule and the top 10.
 */
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(value = 1, jvmArgsAppend = "--add-modules=jdk.incubator.vector")
public class PerEventScoringBenchmark {
    static final int ITEMS = 10_000;
    static final int RANK = 64;
    static final int PAST = 20;
    static final int NEIGHBOURS = 20;
    static final int LIST = 10;

    /** One model version and one researcher, shared by every benchmark. */
    @State(Scope.Thread)
    public static class Model {
        FactorMatrix itemFactors;
        FoldIn foldIn;
        NeighbourLists neighbours;
        int[] items;
        double[] strengths;
        double[] x;
        double[] cf;

        @Setup
        public void setUp() {
            itemFactors = FactorMatrix.random(ITEMS, RANK, 1L);
            foldIn = new FoldIn(FixedFactors.of(itemFactors),
                    AlsConfig.defaults().withRank(RANK).withLambda(0.1).withAlpha(10.0));
            neighbours = randomNeighbours(new SplittableRandom(3));
            SplittableRandom random = new SplittableRandom(2);
            items = random.ints(0, ITEMS).distinct().limit(PAST).toArray();
            strengths = new double[PAST];
            for (int t = 0; t < PAST; t++) {
                strengths[t] = 1 + random.nextInt(3);
            }
            x = foldIn.foldInUser(items, strengths);
            cf = new double[ITEMS];
        }
    }

    /** The fusion rule under test. */
    @State(Scope.Thread)
    public static class Rule {
        @Param({"BLEND", "PRODUCT", "RANK_FUSION"})
        FusionRule rule;

        FusionSettings fusion;

        @Setup
        public void setUp() {
            fusion = new FusionSettings(rule, 0.5, 60, 1e-3);
        }
    }

    /** K distinct neighbours of every compound (never itself), similarities descending in (0, 1]. */
    static NeighbourLists randomNeighbours(SplittableRandom random) {
        int[][] ids = new int[ITEMS][];
        double[][] sims = new double[ITEMS][];
        for (int i = 0; i < ITEMS; i++) {
            final int self = i;
            ids[i] = random.ints(0, ITEMS).filter(j -> j != self).distinct().limit(NEIGHBOURS).toArray();
            sims[i] = random.doubles(NEIGHBOURS, 0.05, 1.0).boxed()
                    .sorted(java.util.Comparator.reverseOrder()).mapToDouble(Double::doubleValue).toArray();
        }
        return new NeighbourLists(ids, sims);
    }

    /** The per-event path the stream calls today: a fresh result and scratch per call. */
    @Benchmark
    public int[] batchPath(Model m, Rule r) {
        OneResearcherScoring.Scores s = OneResearcherScoring.score(m.foldIn, m.itemFactors, m.neighbours, r.fusion,
                m.items, m.strengths);
        return OneResearcherScoring.topN(s.fused(), LIST, i -> true);
    }

    /** CF scores alone, one dot product per compound. */
    @Benchmark
    public double[] cfByRowDots(Model m) {
        OneResearcherScoring.cfScores(m.x, m.itemFactors, m.cf);
        return m.cf;
    }
}
