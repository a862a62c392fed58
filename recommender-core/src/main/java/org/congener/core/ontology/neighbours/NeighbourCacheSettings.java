package org.congener.core.ontology.neighbours;

/**
 * Settings of a {@link NeighbourCache} build.
 *
 * @param k       neighbours kept per compound, &gt;= 1 (default {@value #DEFAULT_K})
 * @param threads worker threads, &gt;= 1 (default: available processors)
 */
public record NeighbourCacheSettings(int k, int threads) {
    public static final int DEFAULT_K = 50;

    public NeighbourCacheSettings {
        if (k < 1) {
            throw new IllegalArgumentException("k must be >= 1, got " + k);
        }
        if (threads < 1) {
            throw new IllegalArgumentException("threads must be >= 1, got " + threads);
        }
    }

    public static NeighbourCacheSettings defaults() {
        return new NeighbourCacheSettings(DEFAULT_K, Runtime.getRuntime().availableProcessors());
    }

    public NeighbourCacheSettings withK(int newK) {
        return new NeighbourCacheSettings(newK, threads);
    }

    public NeighbourCacheSettings withThreads(int newThreads) {
        return new NeighbourCacheSettings(k, newThreads);
    }
}
