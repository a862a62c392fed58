package org.congener.core.factorisation;

/**
 * Settings of BPR-MF (Rendle, Freudenthaler, Gantner &amp; Schmidt-Thieme 2009, "BPR: Bayesian
 * Personalized Ranking from Implicit Feedback", UAI, section 4.2 and Figure 4). Defaults are common
 * practice for BPR-MF, not taken from the paper, which tunes them per data set.
 *
 * @param rank           k (≥ 1; default 32)
 * @param learningRate   α of LearnBPR (&gt; 0; default 0.05)
 * @param regUser        λ_Θ on user factors (≥ 0; default 0.0025)
 * @param regPositive    λ_{H+} on the positive item's factors (≥ 0; default 0.0025)
 * @param regNegative    λ_{H−} on the negative item's factors (≥ 0; default 0.00025)
 * @param regBias        regularisation of the item bias b_i (≥ 0; default 0.01)
 * @param epochs         passes; one pass draws as many (u, i, j) triples as there are interactions (≥ 1)
 * @param initStd        standard deviation of the initial factors (≥ 0; default 0.1)
 * @param seed           seed of initialisation and sampling
 * @param threads        worker threads; the result is fixed by seed and thread count
 */
public record BprConfig(int rank, double learningRate, double regUser, double regPositive, double regNegative,
                        double regBias, int epochs, double initStd, long seed, int threads) {

    public BprConfig {
        check(rank >= 1, "rank must be >= 1: " + rank);
        check(learningRate > 0 && Double.isFinite(learningRate), "learning rate must be > 0: " + learningRate);
        check(regUser >= 0 && regPositive >= 0 && regNegative >= 0 && regBias >= 0, "regularisation must be >= 0");
        check(epochs >= 1, "epochs must be >= 1: " + epochs);
        check(initStd >= 0, "initStd must be >= 0: " + initStd);
        check(threads >= 1, "threads must be >= 1: " + threads);
    }

    private static void check(boolean ok, String message) {
        if (!ok) {
            throw new IllegalArgumentException(message);
        }
    }

    public static BprConfig defaults() {
        return new BprConfig(32, 0.05, 0.0025, 0.0025, 0.00025, 0.01, 30, 0.1, 42L,
                Runtime.getRuntime().availableProcessors());
    }

    public BprConfig withRank(int v) {
        return new BprConfig(v, learningRate, regUser, regPositive, regNegative, regBias, epochs, initStd, seed, threads);
    }

    public BprConfig withLearningRate(double v) {
        return new BprConfig(rank, v, regUser, regPositive, regNegative, regBias, epochs, initStd, seed, threads);
    }

    public BprConfig withRegularisation(double v) {
        return new BprConfig(rank, learningRate, v, v, v / 10, regBias, epochs, initStd, seed, threads);
    }

    public BprConfig withEpochs(int v) {
        return new BprConfig(rank, learningRate, regUser, regPositive, regNegative, regBias, v, initStd, seed, threads);
    }

    public BprConfig withSeed(long v) {
        return new BprConfig(rank, learningRate, regUser, regPositive, regNegative, regBias, epochs, initStd, v, threads);
    }

    public BprConfig withThreads(int v) {
        return new BprConfig(rank, learningRate, regUser, regPositive, regNegative, regBias, epochs, initStd, seed, v);
    }
}
