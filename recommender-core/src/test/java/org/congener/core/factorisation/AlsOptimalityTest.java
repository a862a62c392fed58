package org.congener.core.factorisation;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.congener.core.interactions.InteractionMatrix;
import org.congener.core.interactions.PlantedInteractions;
import org.congener.core.interactions.SparseRows;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;
import org.junit.jupiter.api.Test;

/**
 * First-order optimality of the half-steps and the fold-in's identity with the trainer's user step.
 * The gradient of eq. (3) of Hu, Koren &amp; Volinsky 2008 in the block x_u is
 * 2[(YᵀC_uY + λ_u I) x_u − YᵀC_u p(u)]; after an exact half-step it must vanish.
 */
class AlsOptimalityTest {
    private static final InteractionMatrix DATA = PlantedInteractions.generate(300, 120, 4000, 4, 2.0, 7L);

    private static AlsConfig config(SolverKind solver, Regularisation regularisation) {
        return AlsConfig.defaults().withRank(8).withLambda(0.5).withAlpha(3.0).withIterations(4)
                .withSolver(solver).withRegularisation(regularisation).withThreads(2).withSeed(11L);
    }

    /** max over rows of ‖∇‖ / ‖YᵀC_u p(u)‖, computed naively from the definition. */
    static double relativeGradient(SparseRows rows, FactorMatrix target, FactorMatrix fixed, AlsConfig cfg) {
        int k = cfg.rank();
        double worst = 0;
        for (int r = 0; r < rows.rowCount(); r++) {
            if (rows.rowLength(r) == 0) {
                continue;
            }
            double[] x = target.row(r);
            double[] grad = new double[k];
            double[] rhs = new double[k];
            for (int i = 0; i < fixed.rows(); i++) {
                double s = 0;
                for (int f = 0; f < k; f++) {
                    s += x[f] * fixed.get(i, f);
                }
                // unobserved cells: c = 1, p = 0
                for (int f = 0; f < k; f++) {
                    grad[f] += s * fixed.get(i, f);
                }
            }
            for (int p = rows.rowStart(r); p < rows.rowEnd(r); p++) {
                int i = rows.column(p);
                double c = cfg.confidenceOf(rows.value(p));
                double s = 0;
                for (int f = 0; f < k; f++) {
                    s += x[f] * fixed.get(i, f);
                }
                for (int f = 0; f < k; f++) {
                    grad[f] += ((c - 1) * s - c) * fixed.get(i, f);
                    rhs[f] += c * fixed.get(i, f);
                }
            }
            double lambda = cfg.regularisation().effectiveLambda(cfg.lambda(), rows.rowLength(r));
            double g2 = 0;
            double b2 = 0;
            for (int f = 0; f < k; f++) {
                grad[f] += lambda * x[f];
                g2 += grad[f] * grad[f];
                b2 += rhs[f] * rhs[f];
            }
            worst = Math.max(worst, Math.sqrt(g2 / b2));
        }
        return worst;
    }

    @ParameterizedTest
    @EnumSource(Regularisation.class)
    void shouldZeroTheGradientOfEachBlockWhenHalfStepsAreExact(Regularisation regularisation) {
        AlsConfig cfg = config(SolverKind.CHOLESKY, regularisation);
        ImplicitAls als = new ImplicitAls(cfg);
        AlsModel model = als.fit(DATA);
        // the item half-step was last: Y is optimal for X
        assertTrue(relativeGradient(DATA.byItem(), model.itemFactors(), model.userFactors(), cfg) < 1e-9);
        // a fresh user half-step makes X optimal for Y
        FactorMatrix x = als.userHalfStep(model, DATA);
        assertTrue(relativeGradient(DATA.byUser(), x, model.itemFactors(), cfg) < 1e-9);
    }

    @Test
    void shouldZeroTheGradientWithTheLogConfidenceFormToo() {
        // c = 1 + α ln(1 + r/ε), Hu, Koren & Volinsky 2008, section 4
        AlsConfig cfg = config(SolverKind.CHOLESKY, Regularisation.PLAIN).withConfidence(ConfidenceForm.LOG);
        ImplicitAls als = new ImplicitAls(cfg);
        AlsModel model = als.fit(DATA);
        FactorMatrix x = als.userHalfStep(model, DATA);
        assertTrue(relativeGradient(DATA.byUser(), x, model.itemFactors(), cfg) < 1e-9);
        assertEquals(1 + 3.0 * Math.log(3.0), cfg.confidenceOf(2.0), 1e-12);
    }

    @Test
    void shouldMatchTheTrainersUserHalfStepWhenFoldingInEachUserExactly() {
        AlsConfig cfg = config(SolverKind.CHOLESKY, Regularisation.PLAIN);
        ImplicitAls als = new ImplicitAls(cfg);
        AlsModel model = als.fit(DATA);
        FactorMatrix stepped = als.userHalfStep(model, DATA);
        FoldIn foldIn = model.foldIn();
        for (int u = 0; u < DATA.userCount(); u++) {
            double[] folded = foldIn.foldInUser(DATA.byUser().rowColumns(u), DATA.byUser().rowValues(u));
            assertRelativelyEqual(stepped.row(u), folded, 1e-9);
        }
    }

    @Test
    void shouldMatchTheTrainersCgUserHalfStepWhenFoldingInWarmFromTheOldFactors() {
        AlsConfig cfg = config(SolverKind.CONJUGATE_GRADIENT, Regularisation.PLAIN);
        ImplicitAls als = new ImplicitAls(cfg);
        AlsModel model = als.fit(DATA);
        FactorMatrix stepped = als.userHalfStep(model, DATA);
        FoldIn foldIn = model.foldIn();
        for (int u = 0; u < DATA.userCount(); u++) {
            double[] folded = foldIn.foldInUser(DATA.byUser().rowColumns(u), DATA.byUser().rowValues(u),
                    model.userFactors().row(u), cfg.cgSteps());
            assertRelativelyEqual(stepped.row(u), folded, 1e-9);
        }
    }

    @Test
    void shouldReachTheExactSolutionWhenCgTakesRankManySteps() {
        AlsConfig cfg = config(SolverKind.CHOLESKY, Regularisation.PLAIN);
        AlsModel model = new ImplicitAls(cfg).fit(DATA);
        FoldIn foldIn = model.foldIn();
        for (int u = 0; u < 50; u++) {
            int[] items = DATA.byUser().rowColumns(u);
            double[] r = DATA.byUser().rowValues(u);
            double[] exact = foldIn.foldInUser(items, r);
            // CG on a k × k SPD system is exact after k steps in exact arithmetic; 3k absorbs rounding
            double[] iterative = foldIn.foldInUser(items, r, new double[cfg.rank()], 3 * cfg.rank());
            assertRelativelyEqual(exact, iterative, 1e-8);
        }
    }

    @ParameterizedTest
    @EnumSource(SolverKind.class)
    void shouldLowerTheObjectiveWhenIterating(SolverKind solver) {
        AlsConfig cfg = config(solver, Regularisation.PLAIN).withIterations(6);
        AlsModel model = new ImplicitAls(cfg).fit(DATA, true, TrainingListener.NONE);
        List<Double> history = model.objectiveHistory();
        assertEquals(6, history.size());
        for (int t = 1; t < history.size(); t++) {
            // exact half-steps never raise it; CG steps from a warm start do not either (each CG step
            // lowers the quadratic it solves)
            assertTrue(history.get(t) <= history.get(t - 1) * (1 + 1e-12), "iteration " + t + ": " + history);
        }
        assertTrue(history.get(5) < history.get(0));
    }

    @Test
    void shouldGiveIdenticalFactorsForAnyThreadCount() {
        AlsConfig cfg = config(SolverKind.CONJUGATE_GRADIENT, Regularisation.PLAIN);
        AlsModel one = new ImplicitAls(cfg.withThreads(1)).fit(DATA);
        AlsModel three = new ImplicitAls(cfg.withThreads(3)).fit(DATA);
        assertArrayEquals(one.userFactors().data(), three.userFactors().data(), 0.0);
        assertArrayEquals(one.itemFactors().data(), three.itemFactors().data(), 0.0);
    }

    @Test
    void shouldAgreeBetweenScalarAndVectorKernels() {
        // the test JVM runs with --add-modules=jdk.incubator.vector, so best() must be the vector path
        assertTrue(DenseKernels.best().toString().startsWith("vector"), DenseKernels.best().toString());
        AlsConfig cfg = config(SolverKind.CHOLESKY, Regularisation.PLAIN);
        AlsModel scalar = new ImplicitAls(cfg, DenseKernels.scalar()).fit(DATA);
        AlsModel best = new ImplicitAls(cfg, DenseKernels.best()).fit(DATA);
        assertRelativelyEqual(scalar.userFactors().data(), best.userFactors().data(), 1e-8);
        assertRelativelyEqual(scalar.itemFactors().data(), best.itemFactors().data(), 1e-8);
    }

    @Test
    void shouldComputeTheObjectiveAsTheNaiveSumOverAllCells() {
        AlsConfig cfg = config(SolverKind.CHOLESKY, Regularisation.PER_INTERACTION).withIterations(1);
        AlsModel model = new ImplicitAls(cfg).fit(DATA);
        FactorMatrix x = model.userFactors();
        FactorMatrix y = model.itemFactors();
        double naive = 0;
        for (int u = 0; u < DATA.userCount(); u++) {
            for (int i = 0; i < DATA.itemCount(); i++) {
                double s = 0;
                for (int f = 0; f < cfg.rank(); f++) {
                    s += x.get(u, f) * y.get(i, f);
                }
                boolean observed = DATA.byUser().contains(u, i);
                double r = 0;
                if (observed) {
                    int p = java.util.Arrays.binarySearch(DATA.byUser().columnArray(), DATA.byUser().rowStart(u),
                            DATA.byUser().rowEnd(u), i);
                    r = DATA.byUser().value(p);
                }
                double c = observed ? cfg.confidenceOf(r) : 1.0;
                double pref = observed ? 1.0 : 0.0;
                naive += c * (pref - s) * (pref - s);
            }
            double n2 = 0;
            for (int f = 0; f < cfg.rank(); f++) {
                n2 += x.get(u, f) * x.get(u, f);
            }
            naive += cfg.lambda() * DATA.byUser().rowLength(u) * n2;
        }
        for (int i = 0; i < DATA.itemCount(); i++) {
            double n2 = 0;
            for (int f = 0; f < cfg.rank(); f++) {
                n2 += y.get(i, f) * y.get(i, f);
            }
            naive += cfg.lambda() * DATA.byItem().rowLength(i) * n2;
        }
        double fast = AlsObjective.of(x, y, DATA.byUser(), DATA.byItem(), cfg);
        assertEquals(naive, fast, 1e-9 * Math.abs(naive));
    }

    static void assertRelativelyEqual(double[] expected, double[] actual, double tolerance) {
        assertEquals(expected.length, actual.length);
        double diff = 0;
        double norm = 0;
        for (int t = 0; t < expected.length; t++) {
            diff += (expected[t] - actual[t]) * (expected[t] - actual[t]);
            norm += expected[t] * expected[t];
        }
        assertTrue(Math.sqrt(diff) <= tolerance * Math.sqrt(norm) + 1e-300,
                "relative difference " + Math.sqrt(diff / norm));
    }
}
