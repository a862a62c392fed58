package org.congener.core.ontology.neighbours;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicInteger;

import org.congener.core.ontology.Ontology;
import org.congener.core.ontology.similarity.Aggregation;
import org.congener.core.ontology.similarity.CompoundSimilarity;
import org.congener.core.ontology.similarity.SimilarityMeasure;

/**
 * What the exact top-K searches share: the catalogue in compound id order, the result arrays, the threads.
 *
 * <p>Both searches rest on one bound. Take the ancestors m of the query's terms a in falling order of
 * {@link SimilarityMeasure#upperBound(int, int)} (for Lin 2·IC(m)/(IC(a)+IC(m)); it rises with IC(m)). A pair
 * of terms (a, b) whose MICA has not been taken yet has a similarity no higher than the next bound, and so has a
 * compound all of whose term pairs are in that state, for the maximum and for the best-match average (never
 * above the maximum). The search stops, exactly, when the next bound falls below the K-th best similarity found.
 *
 * <p>Memory: an inverted index (ints per catalogue term and ancestor), the results (K ints and doubles per
 * compound) and per thread a few arrays over compounds and terms; never a matrix of pairs.
 */
abstract class NeighbourSearch {
    private static final int BLOCK = 16;

    final String[] compoundIds;
    final int[][] terms;
    final CompoundSimilarity similarity;
    final SimilarityMeasure measure;
    final Ontology ontology;
    final NeighbourCacheSettings settings;
    final int[] neighbourIndex;
    final double[] neighbourSimilarity;
    final int[] neighbourCount;

    /** One thread's search, with scratch space reused across queries. */
    interface Worker {
        /** Fills the result slots of compound q and returns how many pairs it examined. */
        long search(int q);
    }

    NeighbourSearch(Map<String, int[]> termsByCompound, CompoundSimilarity similarity,
                    NeighbourCacheSettings settings) {
        this.similarity = similarity;
        this.measure = similarity.measure();
        this.ontology = measure.ontology();
        this.settings = settings;
        this.compoundIds = termsByCompound.keySet().toArray(new String[0]);
        Arrays.sort(compoundIds);
        int n = compoundIds.length;
        this.terms = new int[n][];
        for (int c = 0; c < n; c++) {
            int[] raw = termsByCompound.get(compoundIds[c]);
            for (int t : raw) {
                if (t < 0 || t >= ontology.size()) {
                    throw new IllegalArgumentException("compound " + compoundIds[c] + " has term index " + t
                            + " outside the ontology (0.." + (ontology.size() - 1) + ")");
                }
            }
            terms[c] = Arrays.stream(raw).sorted().distinct().toArray();
        }
        int k = settings.k();
        this.neighbourIndex = new int[Math.multiplyExact(n, k)];
        this.neighbourSimilarity = new double[n * k];
        this.neighbourCount = new int[n];
    }

    /** The search that suits the aggregation. */
    static NeighbourSearch create(Map<String, int[]> termsByCompound, CompoundSimilarity similarity,
                                  NeighbourCacheSettings settings) {
        return similarity.aggregation() == Aggregation.MAX
                ? new BestPairSearch(termsByCompound, similarity, settings)
                : new RescoringSearch(termsByCompound, similarity, settings);
    }

    abstract Worker newWorker();

    NeighbourCache run() {
        AtomicInteger next = new AtomicInteger();
        int threads = Math.min(settings.threads(), Math.max(1, compoundIds.length / BLOCK));
        ExecutorService pool = Executors.newFixedThreadPool(threads, runnable -> {
            Thread thread = new Thread(runnable, "neighbour-cache");
            thread.setDaemon(true);
            return thread;
        });
        long pairsScored = 0;
        try {
            List<Future<Long>> workers = new ArrayList<>();
            for (int t = 0; t < threads; t++) {
                workers.add(pool.submit(() -> work(next)));
            }
            for (Future<Long> worker : workers) {
                pairsScored += worker.get();
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("interrupted while building the neighbour cache", e);
        } catch (ExecutionException e) {
            throw new IllegalStateException("neighbour cache build failed", e.getCause());
        } finally {
            pool.shutdownNow();
        }
        return new NeighbourCache(compoundIds, settings.k(), neighbourIndex, neighbourSimilarity, neighbourCount,
                measure.name(), similarity.aggregation(), pairsScored);
    }

    private long work(AtomicInteger next) {
        Worker worker = newWorker();
        long scored = 0;
        int start;
        while ((start = next.getAndAdd(BLOCK)) < compoundIds.length) {
            int end = Math.min(compoundIds.length, start + BLOCK);
            for (int c = start; c < end; c++) {
                scored += worker.search(c);
            }
        }
        return scored;
    }

    /**
     * Packs (bound, position) into longs that sort by rising bound. The bound is rounded up to a float, so the
     * key never understates it and stopping on the key stays exact.
     */
    static long sortKey(double bound, int position) {
        float rounded = (float) bound;
        if (rounded < bound) {
            rounded = Math.nextUp(rounded);
        }
        // non-negative floats sort like their bit patterns
        return ((long) Float.floatToIntBits(rounded) << 32) | position;
    }

    static float boundOf(long key) {
        return Float.intBitsToFloat((int) (key >>> 32));
    }

    static int positionOf(long key) {
        return (int) key;
    }
}
