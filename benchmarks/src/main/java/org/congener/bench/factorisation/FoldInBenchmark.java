package org.congener.bench.factorisation;

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
 * One researcher's fold-in x_u = (YᵀY + Yᵀ(C_u − I)Y + λI)⁻¹ YᵀC_u p(u) with n_u = 50 items at k = 64
 * over 5,000 items: exact (Cholesky) and warm-started CG (3 steps), scalar and Vector API kernels.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(value = 1, jvmArgsAppend = "--add-modules=jdk.incubator.vector")
public class FoldInBenchmark {
    @Param({"64"})
    int rank;

    @Param({"50"})
    int interactions;

    @Param({"vector", "scalar"})
    String kernels;

    private FoldIn foldIn;
    private int[] items;
    private double[] strengths;
    private double[] previous;

    @Setup
    public void setUp() {
        FactorMatrix y = FactorMatrix.random(5000, rank, 1L);
        AlsConfig config = AlsConfig.defaults().withRank(rank).withLambda(0.1).withAlpha(10.0);
        DenseKernels chosen = kernels.equals("vector") ? DenseKernels.best() : DenseKernels.scalar();
        foldIn = new FoldIn(FixedFactors.of(y), config, chosen);
        SplittableRandom random = new SplittableRandom(2);
        items = random.ints(0, 5000).distinct().limit(interactions).sorted().toArray();
        strengths = new double[interactions];
        for (int t = 0; t < interactions; t++) {
            strengths[t] = 1 + random.nextInt(3);
        }
        previous = foldIn.foldInUser(items, strengths);
        // an old vector a little off the optimum, as after one new event
        for (int f = 0; f < rank; f++) {
            previous[f] *= 0.9;
        }
    }

    @Benchmark
    public double[] exactCholesky() {
        return foldIn.foldInUser(items, strengths);
    }

    @Benchmark
    public double[] warmConjugateGradient() {
        return foldIn.foldInUser(items, strengths, previous, 3);
    }
}
