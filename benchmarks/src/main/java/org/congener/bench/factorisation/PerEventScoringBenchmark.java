package org.congener.bench.factorisation;

import java.util.Arrays;
import java.util.Locale;
import java.util.SplittableRandom;
import java.util.concurrent.TimeUnit;
import org.congener.core.factorisation.AlsConfig;
import org.congener.core.factorisation.DenseKernels;
import org.congener.core.factorisation.FactorMatrix;
import org.congener.core.factorisation.FixedFactors;
import org.congener.core.factorisation.FoldIn;
import org.congener.core.fusion.FusionSettings;
import org.congener.core.fusion.NeighbourLists;
import org.congener.core.fusion.OneResearcherScoring;
import org.congener.core.fusion.ResearcherScoring;
import org.congener.core.fusion.ScoringWorkspace;
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
 * compound, the fusion rule and the top 10. The event is the researcher's 20th compound; the warm
 * start is the exact vector of the 19 before it, as the stream would have kept it. {@link #main}
 * prints the multiply-adds of one event and this machine's rate for them.
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
        double[] before;
        double[] foldedIn;
        FoldIn.Workspace foldInWorkspace;

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
            before = foldIn.foldInUser(Arrays.copyOf(items, PAST - 1), Arrays.copyOf(strengths, PAST - 1));
            foldedIn = new double[RANK];
            foldInWorkspace = foldIn.newWorkspace();
        }
    }

    /** The fusion rule under test. */
    @State(Scope.Thread)
    public static class Rule {
        @Param({"BLEND", "PRODUCT", "RANK_FUSION"})
        FusionRule rule;

        FusionSettings fusion;
        ResearcherScoring scoring;
        ScoringWorkspace workspace;

        @Setup
        public void setUp(Model m) {
            fusion = new FusionSettings(rule, 0.5, 60, 1e-3);
            scoring = new ResearcherScoring(m.foldIn, m.itemFactors, m.neighbours, fusion);
            workspace = scoring.newWorkspace();
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

    /** The batch path: fresh arrays per call (before the workspace, this was the stream's path too). */
    @Benchmark
    public int[] batchPath(Model m, Rule r) {
        OneResearcherScoring.Scores s = OneResearcherScoring.score(m.foldIn, m.itemFactors, m.neighbours, r.fusion,
                m.items, m.strengths);
        return OneResearcherScoring.topN(s.fused(), LIST, i -> true);
    }

    /** The workspace path without a warm start: exact fold-in. */
    @Benchmark
    public int[] workspaceExact(Model m, Rule r) {
        return r.scoring.score(m.items, m.strengths, null, r.workspace).topN(LIST, i -> true);
    }

    /** The workspace path warm-started from the vector before the event: converged CG. */
    @Benchmark
    public int[] workspaceWarm(Model m, Rule r) {
        return r.scoring.score(m.items, m.strengths, m.before, r.workspace).topN(LIST, i -> true);
    }

    /** CF scores alone, one dot product per compound (the loop before the blocked product). */
    @Benchmark
    public double[] cfByRowDots(Model m) {
        DenseKernels kernels = DenseKernels.best();
        double[] y = m.itemFactors.data();
        for (int i = 0; i < ITEMS; i++) {
            m.cf[i] = kernels.dot(m.x, 0, y, i * RANK, RANK);
        }
        return m.cf;
    }

    /** CF scores alone, Y·x by the blocked matrix–vector product. */
    @Benchmark
    public double[] cfMatrixVector(Model m) {
        DenseKernels.best().multiply(m.itemFactors.data(), 0, ITEMS, RANK, m.x, 0, m.cf, 0);
        return m.cf;
    }

    /** Fold-in alone: exact, into the caller's array and workspace. */
    @Benchmark
    public double[] foldInExact(Model m) {
        m.foldIn.foldInExact(m.items, m.strengths, m.foldedIn, m.foldInWorkspace);
        return m.foldedIn;
    }

    /** Fold-in alone: CG to convergence from the vector before the event. */
    @Benchmark
    public double[] foldInWarm(Model m) {
        m.foldIn.foldInConverged(m.items, m.strengths, m.before, m.foldedIn, m.foldInWorkspace);
        return m.foldedIn;
    }

    /** Fold-in alone: CG to convergence from zero. */
    @Benchmark
    public double[] foldInCold(Model m) {
        m.foldIn.foldInConverged(m.items, m.strengths, null, m.foldedIn, m.foldInWorkspace);
        return m.foldedIn;
    }

    /**
     * Multiply-adds of one event by part, and the time they need at this machine's rate on one thread
     * (the stream thread), measured by {@link MultiplyAddRate}.
     */
    public static void main(String[] args) throws InterruptedException {
        Model m = new Model();
        m.setUp();
        int k = RANK;
        int n = PAST;
        int warmSteps = m.foldIn.foldInConverged(m.items, m.strengths, m.before, m.foldedIn, m.foldInWorkspace);
        int coldSteps = m.foldIn.foldInConverged(m.items, m.strengths, null, m.foldedIn, m.foldInWorkspace);
        // exact: Σ_i (c_i − 1) y_i y_iᵀ on the upper triangle, b, Cholesky k³/6, two triangular solves
        double exact = n * k * (k + 1) / 2.0 + n * k + k * (double) k * k / 6 + k * (double) k;
        // CG: b and ‖b‖, r₀ = b − Ax₀; per step A·d (k² + 2·n_u·k) and five length-k vector operations
        double cgStart = n * k + k + k * (double) k + 2.0 * n * k + k;
        double perStep = k * (double) k + 2.0 * n * k + 5.0 * k;
        double cf = ITEMS * (double) k;
        double semantic = n * (NEIGHBOURS + 1.0);
        double rate = MultiplyAddRate.best(DenseKernels.best(), 1, 7);
        System.out.printf(Locale.ROOT, "vector kernels, 1 thread: %.2f G multiply-adds/s (best of 7)%n", rate / 1e9);
        print("fold-in exact", exact, rate);
        print("fold-in CG warm (" + warmSteps + " steps)", cgStart + warmSteps * perStep, rate);
        print("fold-in CG cold (" + coldSteps + " steps)", cgStart + coldSteps * perStep, rate);
        print("CF scores I·k", cf, rate);
        print("semantic spread n_u·(K + 1)", semantic, rate);
        print("event, exact fold-in", exact + cf + semantic, rate);
        print("event, warm CG fold-in", cgStart + warmSteps * perStep + cf + semantic, rate);
    }

    private static void print(String what, double multiplyAdds, double rate) {
        System.out.printf(Locale.ROOT, "%-36s %10.0f multiply-adds  %8.1f µs at that rate%n", what, multiplyAdds,
                multiplyAdds / rate * 1e6);
    }
}
