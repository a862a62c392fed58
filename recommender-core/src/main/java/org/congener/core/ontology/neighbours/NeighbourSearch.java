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
import org.congener.core.ontology.similarity.CompoundSimilarity;
import org.congener.core.ontology.similarity.SimilarityMeasure;

/**
 * The exact top-K search behind {@link NeighbourCache}.
 *
 * <p>An inverted index lists, for each term m, the compounds having m among the ancestors of one of their
 * terms. For a query compound Q the search takes the ancestors m of Q's terms in falling order of the bound
 * {@link SimilarityMeasure#upperBound(int, int)} (for Lin: 2·IC(m)/(IC(a)+IC(m))) and scores every compound
 * listed under m that it has not scored yet. A compound B not yet scored shares with each term a of Q a MICA
 * that has not been taken yet, so sim(Q, B) is at most the next bound, for the maximum and for the
 * best-match average (which never exceeds the maximum). The search therefore stops, exactly, when the next
 * bound falls below the K-th best similarity found.
 *
 * <p>Memory: the index (one int per compound and ancestor of its terms), the results (K ints and doubles per
 * compound) and, per thread, two stamp arrays; never a matrix of pairs.
 */
final class NeighbourSearch {
    private static final int BLOCK = 16;

    private final String[] compoundIds;
    private final int[][] terms;
    private final CompoundSimilarity similarity;
    private final SimilarityMeasure measure;
    private final Ontology ontology;
    private final NeighbourCacheSettings settings;
    private final int[] postingOffsets;
    private final int[] postings;
    private final int[] neighbourIndex;
    private final double[] neighbourSimilarity;
    private final int[] neighbourCount;

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
        this.postingOffsets = new int[ontology.size() + 1];
        this.postings = buildPostings();
        int k = settings.k();
        this.neighbourIndex = new int[Math.multiplyExact(n, k)];
        this.neighbourSimilarity = new double[n * k];
        this.neighbourCount = new int[n];
    }

    /** Two passes over the compounds' ancestor unions: count per term, then fill. */
    private int[] buildPostings() {
        int size = ontology.size();
        int[] stamp = new int[size];
        Arrays.fill(stamp, -1);
        int[] counts = new int[size];
        for (int c = 0; c < terms.length; c++) {
            forEachAncestorOnce(c, stamp, m -> counts[m]++);
        }
        for (int m = 0; m < size; m++) {
            postingOffsets[m + 1] = postingOffsets[m] + counts[m];
        }
        int[] data = new int[postingOffsets[size]];
        int[] fill = Arrays.copyOf(postingOffsets, size);
        Arrays.fill(stamp, -1);
        for (int c = 0; c < terms.length; c++) {
            int compound = c;
            forEachAncestorOnce(c, stamp, m -> data[fill[m]++] = compound);
        }
        return data;
    }

    private void forEachAncestorOnce(int c, int[] stamp, java.util.function.IntConsumer action) {
        for (int a : terms[c]) {
            for (int k = ontology.ancestorsFrom(a); k < ontology.ancestorsTo(a); k++) {
                int m = ontology.ancestorAt(k);
                if (stamp[m] != c) {
                    stamp[m] = c;
                    action.accept(m);
                }
            }
        }
    }

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
        Query query = new Query();
        long scored = 0;
        int start;
        while ((start = next.getAndAdd(BLOCK)) < compoundIds.length) {
            int end = Math.min(compoundIds.length, start + BLOCK);
            for (int c = start; c < end; c++) {
                scored += query.search(c);
            }
        }
        return scored;
    }

    /** One thread's scratch space, reused across queries. */
    private final class Query {
        private final int[] scoredStamp = new int[compoundIds.length];
        private final int[] ancestorSlot = new int[ontology.size()];
        private final int[] ancestorStamp = new int[ontology.size()];
        private final TopK top = new TopK(settings.k());
        private long[] order = new long[64];
        private int[] ancestors = new int[64];
        private double[] bounds = new double[64];

        Query() {
            Arrays.fill(scoredStamp, -1);
            Arrays.fill(ancestorStamp, -1);
        }

        long search(int q) {
            int candidates = collectAncestors(q);
            top.clear();
            long scored = 0;
            for (int i = candidates - 1; i >= 0; i--) {
                // the high half of the key is the bound rounded up to a float, never below the true bound
                float bound = Float.intBitsToFloat((int) (order[i] >>> 32));
                if (bound <= 0 || (top.isFull() && bound < top.worstScore())) {
                    break;
                }
                int m = (int) order[i];
                for (int p = postingOffsets[m]; p < postingOffsets[m + 1]; p++) {
                    int c = postings[p];
                    if (c == q || scoredStamp[c] == q) {
                        continue;
                    }
                    scoredStamp[c] = q;
                    scored++;
                    double s = similarity.similarity(terms[q], terms[c]);
                    if (s > 0) {
                        top.offer(s, c);
                    }
                }
            }
            int count = top.drainInto(neighbourIndex, neighbourSimilarity, q * settings.k());
            neighbourCount[q] = count;
            return scored;
        }

        /** The distinct ancestors of Q's terms with their best bound, sorted by rising (float) bound. */
        private int collectAncestors(int q) {
            int n = 0;
            for (int a : terms[q]) {
                for (int k = ontology.ancestorsFrom(a); k < ontology.ancestorsTo(a); k++) {
                    int m = ontology.ancestorAt(k);
                    double bound = measure.upperBound(a, m);
                    if (ancestorStamp[m] == q) {
                        int slot = ancestorSlot[m];
                        bounds[slot] = Math.max(bounds[slot], bound);
                        continue;
                    }
                    if (n == ancestors.length) {
                        ancestors = Arrays.copyOf(ancestors, n * 2);
                        bounds = Arrays.copyOf(bounds, n * 2);
                        order = Arrays.copyOf(order, n * 2);
                    }
                    ancestorStamp[m] = q;
                    ancestorSlot[m] = n;
                    ancestors[n] = m;
                    bounds[n] = bound;
                    n++;
                }
            }
            for (int i = 0; i < n; i++) {
                float rounded = (float) bounds[i];
                if (rounded < bounds[i]) {
                    rounded = Math.nextUp(rounded);
                }
                // non-negative floats sort like their bit patterns
                order[i] = ((long) Float.floatToIntBits(rounded) << 32) | ancestors[i];
            }
            Arrays.sort(order, 0, n);
            return n;
        }
    }
}
