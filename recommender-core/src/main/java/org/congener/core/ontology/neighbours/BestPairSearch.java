package org.congener.core.ontology.neighbours;

import java.util.Arrays;
import java.util.Map;

import org.congener.core.ontology.similarity.CompoundSimilarity;

/**
 * The search for the maximum over term pairs. The index lists, for each term m, every (compound, term b)
 * with m among b's ancestors. Walking entries (a, m) in falling bound order, each listed b gets
 * {@link org.congener.core.ontology.similarity.SimilarityMeasure#similarityThrough(int, int, int)}: a value no
 * higher than sim(a, b), and equal to it when m is their MICA. The first entry through the MICA has a bound at
 * least sim(a, b), so it is reached before the search stops, and the running maximum per compound is exact for
 * every compound kept. No ancestor sets are merged: each step costs O(1).
 */
final class BestPairSearch extends NeighbourSearch {
    private final int[] postingOffsets;
    private final int[] postingCompound;
    private final int[] postingTerm;

    BestPairSearch(Map<String, int[]> termsByCompound, CompoundSimilarity similarity,
                   NeighbourCacheSettings settings) {
        super(termsByCompound, similarity, settings);
        int size = ontology.size();
        postingOffsets = new int[size + 1];
        for (int[] compoundTerms : terms) {
            for (int b : compoundTerms) {
                for (int k = ontology.ancestorsFrom(b); k < ontology.ancestorsTo(b); k++) {
                    postingOffsets[ontology.ancestorAt(k) + 1]++;
                }
            }
        }
        for (int m = 0; m < size; m++) {
            postingOffsets[m + 1] += postingOffsets[m];
        }
        postingCompound = new int[postingOffsets[size]];
        postingTerm = new int[postingOffsets[size]];
        int[] fill = Arrays.copyOf(postingOffsets, size);
        for (int c = 0; c < terms.length; c++) {
            for (int b : terms[c]) {
                for (int k = ontology.ancestorsFrom(b); k < ontology.ancestorsTo(b); k++) {
                    int slot = fill[ontology.ancestorAt(k)]++;
                    postingCompound[slot] = c;
                    postingTerm[slot] = b;
                }
            }
        }
    }

    @Override
    Worker newWorker() {
        return new Worker() {
            private final TopK top = new TopK(settings.k(), compoundIds.length);
            private long[] order = new long[64];
            private int[] entryTerm = new int[64];
            private int[] entryAncestor = new int[64];

            @Override
            public long search(int q) {
                int entries = collectEntries(q);
                long visited = 0;
                for (int i = entries - 1; i >= 0; i--) {
                    float bound = boundOf(order[i]);
                    if (bound <= 0 || (top.isFull() && bound < top.worstScore())) {
                        break;
                    }
                    int e = positionOf(order[i]);
                    int a = entryTerm[e];
                    int m = entryAncestor[e];
                    for (int p = postingOffsets[m]; p < postingOffsets[m + 1]; p++) {
                        int c = postingCompound[p];
                        if (c == q) {
                            continue;
                        }
                        visited++;
                        double s = measure.similarityThrough(a, postingTerm[p], m);
                        if (s > 0) {
                            top.offerOrRaise(s, c);
                        }
                    }
                }
                neighbourCount[q] = top.drainInto(neighbourIndex, neighbourSimilarity, q * settings.k());
                return visited;
            }

            private int collectEntries(int q) {
                int n = 0;
                for (int a : terms[q]) {
                    for (int k = ontology.ancestorsFrom(a); k < ontology.ancestorsTo(a); k++) {
                        if (n == order.length) {
                            order = Arrays.copyOf(order, n * 2);
                            entryTerm = Arrays.copyOf(entryTerm, n * 2);
                            entryAncestor = Arrays.copyOf(entryAncestor, n * 2);
                        }
                        int m = ontology.ancestorAt(k);
                        entryTerm[n] = a;
                        entryAncestor[n] = m;
                        order[n] = sortKey(measure.upperBound(a, m), n);
                        n++;
                    }
                }
                Arrays.sort(order, 0, n);
                return n;
            }
        };
    }
}
