package org.congener.core.ontology.neighbours;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.stream.IntStream;
import java.util.stream.Stream;

import org.congener.core.ontology.similarity.Aggregation;
import org.congener.core.ontology.similarity.CompoundSimilarity;
import org.congener.schemas.ItemNeighbours;
import org.congener.schemas.Neighbour;
import org.congener.schemas.SchemaIds;

/**
 * For every catalogue compound, its K most similar other catalogue compounds, most similar first; ties go to
 * the smaller compound id. Compounds with similarity 0 are never listed, so a list may be shorter than K.
 *
 * <p>Results are exact, the same as scoring all pairs, but far fewer pairs are scored; see
 * {@link NeighbourSearch}. Immutable once built; lookups are safe from any thread.
 */
public final class NeighbourCache {
    private final String[] compoundIds;
    private final Map<String, Integer> indexOfCompound;
    private final int k;
    private final int[] neighbourIndex;
    private final double[] neighbourSimilarity;
    private final int[] neighbourCount;
    private final String measure;
    private final Aggregation aggregation;
    private final long pairsScored;

    NeighbourCache(String[] compoundIds, int k, int[] neighbourIndex, double[] neighbourSimilarity,
                   int[] neighbourCount, String measure, Aggregation aggregation, long pairsScored) {
        this.compoundIds = compoundIds;
        this.k = k;
        this.neighbourIndex = neighbourIndex;
        this.neighbourSimilarity = neighbourSimilarity;
        this.neighbourCount = neighbourCount;
        this.measure = measure;
        this.aggregation = aggregation;
        this.pairsScored = pairsScored;
        this.indexOfCompound = new HashMap<>(compoundIds.length * 2);
        for (int c = 0; c < compoundIds.length; c++) {
            indexOfCompound.put(compoundIds[c], c);
        }
    }

    /**
     * Computes the cache.
     *
     * @param termsByCompound compound id to the dense ids of its ontology terms, taken as a set (not modified); a compound
     *                        without terms gets no neighbours and is nobody's neighbour
     * @param similarity      the term measure and how it aggregates over several terms
     */
    public static NeighbourCache build(Map<String, int[]> termsByCompound, CompoundSimilarity similarity,
                                       NeighbourCacheSettings settings) {
        return NeighbourSearch.create(termsByCompound, similarity, settings).run();
    }

    /** The neighbours of a compound, most similar first; empty for a compound that is not in the catalogue. */
    public List<Neighbour> neighbours(String compoundId) {
        Integer c = indexOfCompound.get(compoundId);
        if (c == null) {
            return List.of();
        }
        List<Neighbour> list = new ArrayList<>(neighbourCount[c]);
        for (int r = 0; r < neighbourCount[c]; r++) {
            list.add(new Neighbour(compoundIds[neighbourIndex[c * k + r]], neighbourSimilarity[c * k + r]));
        }
        return Collections.unmodifiableList(list);
    }

    public boolean contains(String compoundId) {
        return indexOfCompound.containsKey(compoundId);
    }

    /** The compound's list as the record published on the {@code item-neighbours} topic. */
    public ItemNeighbours itemNeighbours(String compoundId, String modelVersion) {
        if (!contains(compoundId)) {
            throw new IllegalArgumentException("compound " + compoundId + " is not in the cache");
        }
        return new ItemNeighbours(SchemaIds.ITEM_NEIGHBOURS, modelVersion, compoundId, measure,
                neighbours(compoundId));
    }

    /** Every compound's record, in compound id order, created lazily as the stream is read. */
    public Stream<ItemNeighbours> allItemNeighbours(String modelVersion) {
        return IntStream.range(0, compoundIds.length).mapToObj(c -> itemNeighbours(compoundIds[c], modelVersion));
    }

    /** Catalogue compound ids, sorted. */
    public List<String> compoundIds() {
        return List.of(compoundIds);
    }

    public int size() {
        return compoundIds.length;
    }

    public int k() {
        return k;
    }

    /** Name of the term measure ({@code lin}, {@code resnik}, {@code jc}). */
    public String measure() {
        return measure;
    }

    public Aggregation aggregation() {
        return aggregation;
    }

    /**
     * How much work the build did: for {@link Aggregation#MAX} the (compound, term) entries visited, each O(1);
     * for best-match average the compound pairs scored in full. An all-pairs scan scores n·(n−1) compound pairs.
     */
    public long pairsScored() {
        return pairsScored;
    }

    @Override
    public String toString() {
        return "NeighbourCache[" + compoundIds.length + " compounds, k=" + k + ", " + measure + ", "
                + aggregation + ", neighbours=" + Arrays.stream(neighbourCount).asLongStream().sum() + "]";
    }
}
