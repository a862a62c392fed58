package org.congener.core.factorisation;

import static org.congener.core.factorisation.AlsOptimalityTest.assertRelativelyEqual;
import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.SplittableRandom;
import java.util.stream.Stream;
import org.congener.core.interactions.InteractionMatrix;
import org.congener.core.interactions.PlantedInteractions;
import org.congener.core.interactions.SparseRows;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * {@link FoldIn#foldInConverged}: conjugate gradient run until ‖r‖ ≤ 1e-11·‖b‖ must land on the exact
 * (Cholesky) solution of Hu, Koren &amp; Volinsky 2008 eq. (4) from any start, and a start near the
 * solution must need fewer steps than a start at zero.
 */
class ConvergedFoldInTest {
    private static final InteractionMatrix DATA = PlantedInteractions.generate(200, 300, 5000, 6, 2.0, 13L);
    private static final int RANK = 16;
    /** The fitted item factors: a trained model's conditioning rather than random rows'. */
    private static final FactorMatrix ITEMS = new ImplicitAls(config(ConfidenceForm.LINEAR, Regularisation.PLAIN))
            .fit(DATA).itemFactors();

    private static AlsConfig config(ConfidenceForm confidence, Regularisation regularisation) {
        return AlsConfig.defaults().withRank(RANK).withLambda(0.05).withAlpha(5.0).withIterations(4).withThreads(1)
                .withSeed(3L).withConfidence(confidence).withRegularisation(regularisation);
    }

    static Stream<Arguments> forms() {
        return Stream.of(ConfidenceForm.values())
                .flatMap(c -> Stream.of(Regularisation.values()).map(r -> Arguments.of(c, r)));
    }

    private static FoldIn foldIn(ConfidenceForm confidence, Regularisation regularisation) {
        return new FoldIn(FixedFactors.of(ITEMS), config(confidence, regularisation));
    }

    @ParameterizedTest
    @MethodSource("forms")
    void shouldReachTheCholeskySolutionWhenStartingFromZero(ConfidenceForm confidence, Regularisation regularisation) {
        FoldIn foldIn = foldIn(confidence, regularisation);
        FoldIn.Workspace ws = foldIn.newWorkspace();
        SparseRows rows = DATA.byUser();
        double[] x = new double[RANK];
        for (int u = 0; u < rows.rowCount(); u++) {
            if (rows.rowLength(u) == 0) {
                continue;
            }
            double[] exact = foldIn.foldInUser(rows.rowColumns(u), rows.rowValues(u));
            int steps = foldIn.foldInConverged(rows.rowColumns(u), rows.rowValues(u), null, x, ws);
            assertRelativelyEqual(exact, x, 1e-9);
            assertTrue(steps >= 1 && steps <= foldIn.convergedStepCap(), "steps " + steps);
        }
    }

    @ParameterizedTest
    @MethodSource("forms")
    void shouldReachTheCholeskySolutionWhenWarmStartedFromAPerturbedSolution(ConfidenceForm confidence,
                                                                            Regularisation regularisation) {
        FoldIn foldIn = foldIn(confidence, regularisation);
        FoldIn.Workspace ws = foldIn.newWorkspace();
        SparseRows rows = DATA.byUser();
        SplittableRandom random = new SplittableRandom(17);
        double[] x = new double[RANK];
        for (int u = 0; u < rows.rowCount(); u += 3) {
            if (rows.rowLength(u) == 0) {
                continue;
            }
            int[] items = rows.rowColumns(u);
            double[] strengths = rows.rowValues(u);
            double[] exact = foldIn.foldInUser(items, strengths);
            double[] start = exact.clone();
            for (int f = 0; f < RANK; f++) {
                start[f] *= 1 + 0.3 * (random.nextDouble() - 0.5);
            }
            double[] startBefore = start.clone();
            foldIn.foldInConverged(items, strengths, start, x, ws);
            assertRelativelyEqual(exact, x, 1e-9);
            assertArrayEquals(startBefore, start, 0.0, "the start is not modified");
            // start and result in one array, as the stream keeps them
            foldIn.foldInConverged(items, strengths, start, start, ws);
            assertRelativelyEqual(exact, start, 1e-9);
        }
    }

    @ParameterizedTest
    @MethodSource("forms")
    void shouldTakeFewerStepsInAllWhenWarmStartedFromTheSolutionsBeforeOneMoreInteraction(ConfidenceForm confidence,
                                                                                          Regularisation regularisation) {
        FoldIn foldIn = foldIn(confidence, regularisation);
        FoldIn.Workspace ws = foldIn.newWorkspace();
        SparseRows rows = DATA.byUser();
        SplittableRandom random = new SplittableRandom(19);
        double[] before = new double[RANK];
        double[] after = new double[RANK];
        int researchers = 0;
        long coldSteps = 0;
        long warmSteps = 0;
        for (int u = 0; u < rows.rowCount(); u += 5) {
            int[] items = rows.rowColumns(u);
            if (items.length < 2) {
                continue;
            }
            double[] strengths = rows.rowValues(u);
            int n = items.length;
            // the researcher's vector before the newest interaction, then the event adds it
            foldIn.foldInConverged(Arrays.copyOf(items, n - 1), Arrays.copyOf(strengths, n - 1), null, before, ws);
            strengths[n - 1] = 1 + random.nextInt(3);
            int cold = foldIn.foldInConverged(items, strengths, null, after, ws);
            double[] coldSolution = after.clone();
            int warm = foldIn.foldInConverged(items, strengths, before, after, ws);
            assertRelativelyEqual(coldSolution, after, 1e-9);
            coldSteps += cold;
            warmSteps += warm;
            researchers++;
        }
        assertTrue(researchers >= 20, "researchers compared: " + researchers);
        // one interaction more moves the solution only part of the way, so the saving is a step or two
        // per researcher, not every researcher's: the count over all of them must fall
        assertTrue(warmSteps < coldSteps, "warm " + warmSteps + " steps, cold " + coldSteps);
    }

    static Stream<Arguments> randomSizes() {
        // k = 64 and 32 take the vector kernel's eight- and four-block paths at eight lanes, 13 the general one
        return Stream.of(Arguments.of(64, 200), Arguments.of(64, 20), Arguments.of(64, 1), Arguments.of(32, 77),
                Arguments.of(13, 50));
    }

    @ParameterizedTest
    @MethodSource("randomSizes")
    void shouldReachTheCholeskySolutionOnRandomFactorsWithEitherKernels(int rank, int history) {
        FactorMatrix y = FactorMatrix.random(2000, rank, 5L);
        SplittableRandom random = new SplittableRandom(rank * 1000L + history);
        int[] items = random.ints(0, 2000).distinct().limit(history).toArray();
        double[] strengths = random.doubles(history, 0.5, 4).toArray();
        for (ConfidenceForm confidence : ConfidenceForm.values()) {
            AlsConfig config = AlsConfig.defaults().withRank(rank).withLambda(0.1).withAlpha(10.0)
                    .withConfidence(confidence).withRegularisation(Regularisation.PLAIN);
            for (DenseKernels kernels : new DenseKernels[] {DenseKernels.best(), DenseKernels.scalar()}) {
                FoldIn foldIn = new FoldIn(FixedFactors.of(y), config, kernels);
                FoldIn.Workspace ws = foldIn.newWorkspace();
                double[] exact = foldIn.foldInUser(items, strengths);
                double[] x = new double[rank];
                int cold = foldIn.foldInConverged(items, strengths, null, x, ws);
                String where = kernels + ", " + confidence + ", k " + rank + ", n_u " + history;
                assertRelativelyEqual(exact, x, 1e-9);
                assertTrue(cold >= 1 && cold <= foldIn.convergedStepCap(), where + ": steps " + cold);
                double[] start = exact.clone();
                for (int f = 0; f < rank; f++) {
                    start[f] *= 1 + 0.2 * (random.nextDouble() - 0.5);
                }
                foldIn.foldInConverged(items, strengths, start, x, ws);
                assertRelativelyEqual(exact, x, 1e-9);
            }
        }
    }

    @Test
    void shouldGiveTheZeroVectorInNoStepsWhenTheResearcherHasNoInteractions() {
        FoldIn foldIn = foldIn(ConfidenceForm.LINEAR, Regularisation.PER_INTERACTION);
        double[] start = new double[RANK];
        Arrays.fill(start, 0.5);
        double[] x = new double[RANK];
        assertEquals(0, foldIn.foldInConverged(new int[0], new double[0], start, x, foldIn.newWorkspace()));
        assertArrayEquals(new double[RANK], x, 0.0);
    }

    @Test
    void shouldEqualTheAllocatingExactFoldInBitForBitWhenSolvingIntoTheCallersArray() {
        FoldIn foldIn = foldIn(ConfidenceForm.LOG, Regularisation.PLAIN);
        FoldIn.Workspace ws = foldIn.newWorkspace();
        double[] x = new double[RANK];
        for (int u = 0; u < 40; u++) {
            int[] items = DATA.byUser().rowColumns(u);
            double[] strengths = DATA.byUser().rowValues(u);
            foldIn.foldInExact(items, strengths, x, ws);
            assertArrayEquals(foldIn.foldInUser(items, strengths), x, 0.0, "researcher " + u);
        }
    }

    @Test
    void shouldRefuseAWorkspaceOrVectorOfAnotherRank() {
        FoldIn foldIn = foldIn(ConfidenceForm.LINEAR, Regularisation.PLAIN);
        int[] items = {1, 2};
        double[] strengths = {1, 1};
        assertThrows(IllegalArgumentException.class,
                () -> foldIn.foldInConverged(items, strengths, null, new double[RANK], new FoldIn.Workspace(RANK + 1)));
        assertThrows(IllegalArgumentException.class,
                () -> foldIn.foldInConverged(items, strengths, new double[RANK - 1], new double[RANK], foldIn.newWorkspace()));
    }
}
