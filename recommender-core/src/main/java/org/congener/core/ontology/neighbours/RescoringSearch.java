package org.congener.core.ontology.neighbours;

import java.util.Arrays;
import java.util.Map;

import org.congener.core.ontology.similarity.Aggregation;
import org.congener.core.ontology.similarity.CompoundSimilarity;

/**
 * The search for aggregations other than the maximum (best-match average): the index lists, for each term m,
 * the compounds having m among the ancestors of one of their terms; each compound met for the first time is
 * scored in full. Ancestors are taken once, with the best bound over the query's terms.
 *
 * <p>Scoring in full costs one pass over the ancestors of each of the candidate's terms: the query's ancestors are
 * marked beforehand in a per-thread array, with a bit per query term, so every MICA of a candidate term with
 * each query term comes out of that one pass (instead of a merge per term pair). Queries with more than 31
 * terms fall back to {@link CompoundSimilarity}.
 */
final class RescoringSearch extends NeighbourSearch {
    private final int[] postingOffsets;
    private final int[] postings;

    RescoringSearch(Map<String, int[]> termsByCompound, CompoundSimilarity similarity,
                    NeighbourCacheSettings settings) {
        super(termsByCompound, similarity, settings);
        int size = ontology.size();
        postingOffsets = new int[size + 1];
        int[] stamp = new int[size];
        Arrays.fill(stamp, -1);
        for (int c = 0; c < terms.length; c++) {
            for (int m : ancestorsOnce(c, stamp)) {
                postingOffsets[m + 1]++;
            }
        }
        for (int m = 0; m < size; m++) {
            postingOffsets[m + 1] += postingOffsets[m];
        }
        postings = new int[postingOffsets[size]];
        int[] fill = Arrays.copyOf(postingOffsets, size);
        Arrays.fill(stamp, -1);
        for (int c = 0; c < terms.length; c++) {
            for (int m : ancestorsOnce(c, stamp)) {
                postings[fill[m]++] = c;
            }
        }
    }

    /** The union of the ancestor sets of compound c's terms. */
    private int[] ancestorsOnce(int c, int[] stamp) {
        int total = 0;
        for (int a : terms[c]) {
            total += ontology.ancestorCount(a);
        }
        int[] union = new int[total];
        int n = 0;
        for (int a : terms[c]) {
            for (int k = ontology.ancestorsFrom(a); k < ontology.ancestorsTo(a); k++) {
                int m = ontology.ancestorAt(k);
                if (stamp[m] != c) {
                    stamp[m] = c;
                    union[n++] = m;
                }
            }
        }
        return Arrays.copyOf(union, n);
    }

    @Override
    Worker newWorker() {
        return new Worker() {
            private final int[] scoredStamp = filled(compoundIds.length);
            private final int[] ancestorSlot = new int[ontology.size()];
            private final int[] ancestorStamp = filled(ontology.size());
            private final TopK top = new TopK(settings.k(), compoundIds.length);
            private final int[] markStamp = filled(ontology.size());
            private final int[] markMask = new int[ontology.size()];
            private long[] order = new long[64];
            private int[] ancestors = new int[64];
            private double[] bounds = new double[64];
            private final int[] processedStamp = filled(ontology.size());
            private long[] termEntries = new long[64];
            private int[] termOffsets = new int[8];
            private int[] termCursor = new int[8];
            private double[] matrix = new double[16];
            private double[] micaIc = new double[4];
            private int[] mica = new int[4];

            @Override
            public long search(int q) {
                boolean marked = terms[q].length <= 31;
                if (marked) {
                    markAncestors(q);
                }
                int entries = collectAncestors(q);
                boolean perTermBound = similarity.aggregation() == Aggregation.BEST_MATCH_AVERAGE
                        && terms[q].length > 1;
                if (perTermBound) {
                    collectTermEntries(q);
                }
                long scored = 0;
                for (int i = entries - 1; i >= 0; i--) {
                    double bound = perTermBound ? bestMatchAverageBound(q) : boundOf(order[i]);
                    if (bound <= 0 || (top.isFull() && bound < top.worstScore())) {
                        break;
                    }
                    int m = ancestors[positionOf(order[i])];
                    processedStamp[m] = q;
                    for (int p = postingOffsets[m]; p < postingOffsets[m + 1]; p++) {
                        int c = postings[p];
                        if (c == q || scoredStamp[c] == q) {
                            continue;
                        }
                        scoredStamp[c] = q;
                        scored++;
                        double s = marked ? score(q, c) : similarity.similarity(terms[q], terms[c]);
                        if (s > 0) {
                            top.offerOrRaise(s, c);
                        }
                    }
                }
                neighbourCount[q] = top.drainInto(neighbourIndex, neighbourSimilarity, q * settings.k());
                return scored;
            }

            /** Each query term's own ancestors, by falling bound, for {@link #bestMatchAverageBound(int)}. */
            private void collectTermEntries(int q) {
                int[] queryTerms = terms[q];
                if (termOffsets.length <= queryTerms.length) {
                    termOffsets = new int[queryTerms.length + 1];
                    termCursor = new int[queryTerms.length];
                }
                int n = 0;
                for (int i = 0; i < queryTerms.length; i++) {
                    int a = queryTerms[i];
                    termOffsets[i] = n;
                    int needed = n + ontology.ancestorCount(a);
                    if (termEntries.length < needed) {
                        termEntries = Arrays.copyOf(termEntries, needed * 2);
                    }
                    for (int k = ontology.ancestorsFrom(a); k < ontology.ancestorsTo(a); k++) {
                        int m = ontology.ancestorAt(k);
                        termEntries[n++] = sortKey(measure.upperBound(a, m), m);
                    }
                    Arrays.sort(termEntries, termOffsets[i], n);
                    termCursor[i] = n - 1;
                }
                termOffsets[queryTerms.length] = n;
            }

            /**
             * A bound on the best-match average of every compound not scored yet. For each query term a_i let
             * β_i be the bound of its best ancestor not taken yet: every pair (a_i, b) of such a compound has its
             * MICA among those, so sim(a_i, b) ≤ β_i. Rows then average to at most mean β_i and columns to at
             * most max β_i, so BMA ≤ ½(mean β_i + max β_i), tighter than max β_i when the terms differ.
             */
            private double bestMatchAverageBound(int q) {
                int p = terms[q].length;
                double sum = 0;
                double max = 0;
                for (int i = 0; i < p; i++) {
                    int at = termCursor[i];
                    while (at >= termOffsets[i] && processedStamp[positionOf(termEntries[at])] == q) {
                        at--;
                    }
                    termCursor[i] = at;
                    double beta = at >= termOffsets[i] ? boundOf(termEntries[at]) : 0.0;
                    sum += beta;
                    max = Math.max(max, beta);
                }
                // rounded up so that floating-point error never makes the bound too low
                return Math.nextUp(0.5 * (sum / p + max));
            }

            private void markAncestors(int q) {
                int[] queryTerms = terms[q];
                for (int i = 0; i < queryTerms.length; i++) {
                    int a = queryTerms[i];
                    for (int k = ontology.ancestorsFrom(a); k < ontology.ancestorsTo(a); k++) {
                        int m = ontology.ancestorAt(k);
                        if (markStamp[m] != q) {
                            markStamp[m] = q;
                            markMask[m] = 0;
                        }
                        markMask[m] |= 1 << i;
                    }
                }
            }

            /** The aggregated similarity of q and c, from one pass over the ancestors of each of c's terms. */
            private double score(int q, int c) {
                int[] queryTerms = terms[q];
                int[] candidateTerms = terms[c];
                int rows = queryTerms.length;
                int columns = candidateTerms.length;
                if (rows == 0 || columns == 0) {
                    return 0.0;
                }
                if (matrix.length < rows * columns) {
                    matrix = new double[rows * columns * 2];
                }
                if (micaIc.length < rows) {
                    micaIc = new double[rows * 2];
                    mica = new int[rows * 2];
                }
                for (int j = 0; j < columns; j++) {
                    int b = candidateTerms[j];
                    Arrays.fill(micaIc, 0, rows, -1.0);
                    for (int k = ontology.ancestorsFrom(b); k < ontology.ancestorsTo(b); k++) {
                        int m = ontology.ancestorAt(k);
                        if (markStamp[m] != q) {
                            continue;
                        }
                        double value = measure.informationContent().of(m);
                        for (int bits = markMask[m]; bits != 0; bits &= bits - 1) {
                            int i = Integer.numberOfTrailingZeros(bits);
                            if (value > micaIc[i]) {
                                micaIc[i] = value;
                                mica[i] = m;
                            }
                        }
                    }
                    for (int i = 0; i < rows; i++) {
                        matrix[i * columns + j] = measure.similarityThrough(queryTerms[i], b, mica[i]);
                    }
                }
                return similarity.aggregation() == Aggregation.BEST_MATCH_AVERAGE
                        ? CompoundSimilarity.bestMatchAverage(matrix, rows, columns)
                        : maxOf(matrix, rows * columns);
            }

            /** The distinct ancestors of the query's terms, each with its best bound. */
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
                    order[i] = sortKey(bounds[i], i);
                }
                Arrays.sort(order, 0, n);
                return n;
            }
        };
    }

    private static double maxOf(double[] values, int count) {
        double best = 0.0;
        for (int i = 0; i < count; i++) {
            best = Math.max(best, values[i]);
        }
        return best;
    }

    private static int[] filled(int length) {
        int[] array = new int[length];
        Arrays.fill(array, -1);
        return array;
    }
}
