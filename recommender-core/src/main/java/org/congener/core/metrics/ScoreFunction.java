package org.congener.core.metrics;

/** Scores of every item for one user; higher is better. Must be safe to call from several threads. */
@FunctionalInterface
public interface ScoreFunction {
    /** Writes one score per item into {@code out} (length = item count). */
    void scoreAll(int user, double[] out);
}
