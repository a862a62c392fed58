package org.congener.bench.factorisation;

import java.util.Locale;
import org.congener.core.factorisation.AlsConfig;
import org.congener.core.factorisation.DenseKernels;
import org.congener.core.factorisation.ImplicitAls;
import org.congener.core.factorisation.SolverKind;
import org.congener.core.interactions.InteractionMatrix;
import org.congener.core.interactions.PlantedInteractions;

/**
 * Congener's ALS fit alone on planted data, scalar against Vector API kernels, both solvers, rounds
 * interleaved. Arguments: [users items interactions rank rounds].
 */
public final class AlsFitTiming {
    private AlsFitTiming() {
    }

    public static void main(String[] args) {
        int users = args.length > 0 ? Integer.parseInt(args[0]) : 20_000;
        int items = args.length > 1 ? Integer.parseInt(args[1]) : 5_000;
        int nnz = args.length > 2 ? Integer.parseInt(args[2]) : 500_000;
        int rank = args.length > 3 ? Integer.parseInt(args[3]) : 64;
        int rounds = args.length > 4 ? Integer.parseInt(args[4]) : 3;
        InteractionMatrix m = PlantedInteractions.generate(users, items, nnz, 16, 2.0, 20L);
        AlsConfig base = AlsConfig.defaults().withRank(rank).withIterations(10).withLambda(0.01).withAlpha(1.0)
                .withThreads(2);
        DenseKernels[] kernels = {DenseKernels.scalar(), DenseKernels.best()};
        for (int r = 0; r < rounds; r++) {
            for (SolverKind solver : SolverKind.values()) {
                for (DenseKernels k : kernels) {
                    long t0 = System.nanoTime();
                    new ImplicitAls(base.withSolver(solver), k).fit(m);
                    System.out.printf(Locale.ROOT, "round %d %s %s: %.2f s%n", r + 1, solver, k,
                            (System.nanoTime() - t0) / 1e9);
                }
            }
        }
    }
}
