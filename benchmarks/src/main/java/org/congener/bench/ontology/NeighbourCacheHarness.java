package org.congener.bench.ontology;

import java.util.Locale;
import java.util.Map;

import org.congener.core.ontology.Ontology;
import org.congener.core.ontology.ic.SecoIntrinsicIc;
import org.congener.core.ontology.neighbours.NeighbourCache;
import org.congener.core.ontology.neighbours.NeighbourCacheSettings;
import org.congener.core.ontology.similarity.Aggregation;
import org.congener.core.ontology.similarity.CompoundSimilarity;
import org.congener.core.ontology.similarity.MeasureKind;

/**
 * End-to-end timing of one neighbour-cache build (a single long run, so a plain harness rather than JMH):
 * a generated DAG, a generated catalogue, Lin with Seco's IC, K = 50. Prints wall time, pairs scored against
 * the all-pairs count, and heap: live heap after the build minus before it (what the cache and its index
 * retain) and the peak heap use during the build (run with a small -Xmx to see that it fits).
 *
 * <p>Arguments (all optional): terms compounds threads k measure aggregation runs.
 */
public final class NeighbourCacheHarness {
    private NeighbourCacheHarness() {
    }

    public static void main(String[] args) {
        int terms = args.length > 0 ? Integer.parseInt(args[0]) : 200_000;
        int compounds = args.length > 1 ? Integer.parseInt(args[1]) : 20_000;
        int threads = args.length > 2 ? Integer.parseInt(args[2]) : 2;
        int k = args.length > 3 ? Integer.parseInt(args[3]) : NeighbourCacheSettings.DEFAULT_K;
        MeasureKind measure = MeasureKind.fromLabel(args.length > 4 ? args[4] : "lin");
        Aggregation aggregation = Aggregation.valueOf(args.length > 5 ? args[5] : "MAX");
        int runs = args.length > 6 ? Integer.parseInt(args[6]) : 3;

        long t0 = System.nanoTime();
        Ontology ontology = SyntheticCatalogue.dag(terms, 0.3, 7);
        Map<String, int[]> catalogue = SyntheticCatalogue.compounds(ontology, compounds, 8);
        CompoundSimilarity similarity = new CompoundSimilarity(
                measure.create(ontology, SecoIntrinsicIc.compute(ontology)), aggregation);
        long t1 = System.nanoTime();
        long ancestorEntries = 0;
        for (int t = 0; t < ontology.size(); t++) {
            ancestorEntries += ontology.ancestorCount(t);
        }
        System.out.printf(Locale.ROOT, "dag: %d terms, %d edges, max depth %d, mean ancestor set %.1f; "
                        + "catalogue %d compounds; setup %.2f s%n", ontology.termCount(), ontology.edgeCount(),
                ontology.maxDepth(), (double) ancestorEntries / ontology.size(), catalogue.size(), (t1 - t0) / 1e9);

        for (int run = 1; run <= runs; run++) {
            long before = liveHeap();
            HeapPeaks.reset();
            long start = System.nanoTime();
            NeighbourCache cache = NeighbourCache.build(catalogue, similarity, new NeighbourCacheSettings(k, threads));
            long elapsed = System.nanoTime() - start;
            long peak = HeapPeaks.peak();
            long after = liveHeap();
            long allPairs = (long) compounds * (compounds - 1);
            System.out.printf(Locale.ROOT, "run %d: %s, %d threads: %.2f s; entries visited %d (all pairs: %d); "
                            + "live heap before %.1f MB (ontology, IC, catalogue), retained by the cache %.1f MB, "
                            + "peak heap during build %.1f MB%n", run, cache, threads,
                    elapsed / 1e9, cache.pairsScored(), allPairs, before / 1e6, (after - before) / 1e6, peak / 1e6);
        }
    }

    private static long liveHeap() {
        for (int i = 0; i < 3; i++) {
            System.gc();
        }
        Runtime runtime = Runtime.getRuntime();
        return runtime.totalMemory() - runtime.freeMemory();
    }
}
