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
 * The stream's fold-in alone: {@link FoldIn#foldInConverged}, CG to ‖r‖ ≤ 1e-11·‖b‖ at k = 64 over
 * I = 10,000 compounds, for a researcher with n_u past compounds (20, and 200 — about the mean history
 * of the end-to-end run). Warm: the event is the n_u-th compound and CG starts from the exact vector of
 * the n_u − 1 before it, as the stream keeps it. Cold: CG starts from zero. {@link #main} prints the
 * CG steps each case takes.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(value = 1, jvmArgsAppend = "--add-modules=jdk.incubator.vector")
public class ConvergedFoldInBenchmark {
    static final int ITEMS = 10_000;
    static final int RANK = 64;

    @Param({"20", "200"})
    int history;

    private FoldIn foldIn;
    private FoldIn.Workspace workspace;
    private int[] items;
    private double[] strengths;
    private double[] before;
    private double[] x;

    @Setup
    public void setUp() {
        FactorMatrix y = FactorMatrix.random(ITEMS, RANK, 1L);
        foldIn = new FoldIn(FixedFactors.of(y), AlsConfig.defaults().withRank(RANK).withLambda(0.1).withAlpha(10.0),
                DenseKernels.best());
        workspace = foldIn.newWorkspace();
        SplittableRandom random = new SplittableRandom(2);
        items = random.ints(0, ITEMS).distinct().limit(history).toArray();
        strengths = new double[history];
        for (int t = 0; t < history; t++) {
            strengths[t] = 1 + random.nextInt(3);
        }
        before = foldIn.foldInUser(Arrays.copyOf(items, history - 1), Arrays.copyOf(strengths, history - 1));
        x = new double[RANK];
    }

    @Benchmark
    public double[] warm() {
        foldIn.foldInConverged(items, strengths, before, x, workspace);
        return x;
    }

    @Benchmark
    public double[] cold() {
        foldIn.foldInConverged(items, strengths, null, x, workspace);
        return x;
    }

    /** The CG steps of each case, which the times above divide into. */
    public static void main(String[] args) {
        for (int history : new int[] {20, 200}) {
            ConvergedFoldInBenchmark b = new ConvergedFoldInBenchmark();
            b.history = history;
            b.setUp();
            int warm = b.foldIn.foldInConverged(b.items, b.strengths, b.before, b.x, b.workspace);
            int cold = b.foldIn.foldInConverged(b.items, b.strengths, null, b.x, b.workspace);
            System.out.printf(Locale.ROOT, "k = %d, n_u = %d: warm %d CG steps, cold %d%n", RANK, history, warm, cold);
        }
    }
}
