package org.congener.demo;

import java.util.List;
import java.util.Random;

/**
 * Seeded draws for the generator. Backed by {@link java.util.Random}, whose algorithm (including
 * {@code nextGaussian}) is fixed by its specification, so a seed gives the same data on every JDK.
 * Each part of the generator gets its own stream ({@link #fork}) so that changing one part does not
 * shift the draws of another.
 */
final class DemoRandom {

    private final Random random;

    DemoRandom(long seed) {
        this.random = new Random(seed);
    }

    /** An independent stream for one named part of the generator. */
    static DemoRandom fork(long seed, String part) {
        long h = 1125899906842597L;
        for (int i = 0; i < part.length(); i++) {
            h = 31 * h + part.charAt(i);
        }
        return new DemoRandom(seed ^ h);
    }

    double uniform() {
        return random.nextDouble();
    }

    int below(int bound) {
        return random.nextInt(bound);
    }

    /** Uniform integer in [from, to]. */
    int between(int from, int to) {
        return from + random.nextInt(to - from + 1);
    }

    boolean chance(double p) {
        return random.nextDouble() < p;
    }

    double gaussian() {
        return random.nextGaussian();
    }

    /** exp(σ·Z): a log-normal factor with median 1. */
    double logNormal(double sigma) {
        return Math.exp(sigma * random.nextGaussian());
    }

    <T> T pick(List<T> items) {
        return items.get(random.nextInt(items.size()));
    }

    /** Index drawn with probability proportional to {@code weights[i]}; all weights non-negative, sum > 0. */
    int weightedIndex(double[] weights) {
        return weightedIndex(weights, 0, weights.length);
    }

    /** As {@link #weightedIndex(double[])} over {@code weights[from..until)}; returns an offset from {@code from}. */
    int weightedIndex(double[] weights, int from, int until) {
        double total = 0;
        for (int i = from; i < until; i++) {
            total += weights[i];
        }
        double target = random.nextDouble() * total;
        for (int i = from; i < until; i++) {
            target -= weights[i];
            if (target < 0) {
                return i - from;
            }
        }
        return until - 1 - from;
    }
}
