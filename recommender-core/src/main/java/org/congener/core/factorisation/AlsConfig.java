package org.congener.core.factorisation;

/**
 * Settings of implicit-feedback ALS, each validated here once.
 *
 * @param rank           k, number of latent factors (≥ 1; default 32)
 * @param lambda         λ, regularisation (≥ 0; default 0.1)
 * @param alpha          α in the confidence (≥ 0; default 10)
 * @param epsilon        ε of the log confidence form (&gt; 0; default 1)
 * @param confidence     linear or log confidence (default linear)
 * @param regularisation plain λ (the paper) or λ·n_u (Spark's weighting)
 * @param solver         Cholesky or conjugate gradient (default CG)
 * @param cgSteps        CG steps per row and half-step (≥ 1; default 3, as Takács et al. 2011 suggest)
 * @param iterations     full sweeps, one user and one item half-step each (≥ 1; default 10)
 * @param seed           seed of the initial item factors
 * @param threads        worker threads (≥ 1); results are identical for any thread count
 */
public record AlsConfig(int rank, double lambda, double alpha, double epsilon, ConfidenceForm confidence,
                        Regularisation regularisation, SolverKind solver, int cgSteps, int iterations,
                        long seed, int threads) {

    public AlsConfig {
        require(rank >= 1, "rank must be >= 1: " + rank);
        require(Double.isFinite(lambda) && lambda >= 0, "lambda must be finite and >= 0: " + lambda);
        require(Double.isFinite(alpha) && alpha >= 0, "alpha must be finite and >= 0: " + alpha);
        require(Double.isFinite(epsilon) && epsilon > 0, "epsilon must be finite and > 0: " + epsilon);
        require(confidence != null && regularisation != null && solver != null, "forms must be given");
        require(cgSteps >= 1, "cgSteps must be >= 1: " + cgSteps);
        require(iterations >= 1, "iterations must be >= 1: " + iterations);
        require(threads >= 1, "threads must be >= 1: " + threads);
    }

    private static void require(boolean ok, String message) {
        if (!ok) {
            throw new IllegalArgumentException(message);
        }
    }

    public static AlsConfig defaults() {
        return new AlsConfig(32, 0.1, 10.0, 1.0, ConfidenceForm.LINEAR, Regularisation.PLAIN,
                SolverKind.CONJUGATE_GRADIENT, 3, 10, 42L, Runtime.getRuntime().availableProcessors());
    }

    public double confidenceOf(double strength) {
        return confidence.confidence(strength, alpha, epsilon);
    }

    public AlsConfig withRank(int v) {
        return new AlsConfig(v, lambda, alpha, epsilon, confidence, regularisation, solver, cgSteps, iterations, seed, threads);
    }

    public AlsConfig withLambda(double v) {
        return new AlsConfig(rank, v, alpha, epsilon, confidence, regularisation, solver, cgSteps, iterations, seed, threads);
    }

    public AlsConfig withAlpha(double v) {
        return new AlsConfig(rank, lambda, v, epsilon, confidence, regularisation, solver, cgSteps, iterations, seed, threads);
    }

    public AlsConfig withConfidence(ConfidenceForm v) {
        return new AlsConfig(rank, lambda, alpha, epsilon, v, regularisation, solver, cgSteps, iterations, seed, threads);
    }

    public AlsConfig withRegularisation(Regularisation v) {
        return new AlsConfig(rank, lambda, alpha, epsilon, confidence, v, solver, cgSteps, iterations, seed, threads);
    }

    public AlsConfig withSolver(SolverKind v) {
        return new AlsConfig(rank, lambda, alpha, epsilon, confidence, regularisation, v, cgSteps, iterations, seed, threads);
    }

    public AlsConfig withCgSteps(int v) {
        return new AlsConfig(rank, lambda, alpha, epsilon, confidence, regularisation, solver, v, iterations, seed, threads);
    }

    public AlsConfig withIterations(int v) {
        return new AlsConfig(rank, lambda, alpha, epsilon, confidence, regularisation, solver, cgSteps, v, seed, threads);
    }

    public AlsConfig withSeed(long v) {
        return new AlsConfig(rank, lambda, alpha, epsilon, confidence, regularisation, solver, cgSteps, iterations, v, threads);
    }

    public AlsConfig withThreads(int v) {
        return new AlsConfig(rank, lambda, alpha, epsilon, confidence, regularisation, solver, cgSteps, iterations, seed, v);
    }
}
