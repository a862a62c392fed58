package org.congener.core.ontology.neighbours;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.congener.core.ontology.CompoundTerms;
import org.congener.core.ontology.Ontology;
import org.congener.core.ontology.ic.InformationContent;
import org.congener.core.ontology.ic.SecoIntrinsicIc;
import org.congener.core.ontology.similarity.Aggregation;
import org.congener.core.ontology.similarity.CompoundSimilarity;
import org.congener.core.ontology.similarity.LinSimilarity;

/**
 * The neighbour cache of a catalogue under the project's default measure: Lin (1998) on intrinsic IC
 * after Seco, Veale &amp; Hayes (2004), a compound pair scored by its best term pair. The trainer
 * publishes these lists with every model version; the streams app builds the same lists itself for
 * the time before any version is live.
 */
public final class CatalogueNeighbours {

    /** The cache plus what could not be used. */
    public record Result(NeighbourCache cache, int compoundsWithoutTerms, int unknownTermIds) {
    }

    private CatalogueNeighbours() {
    }

    /**
     * @param termIdsByCompound each compound's ontology term ids as the catalogue gives them; a compound
     *                          with no known term gets no neighbours and is nobody's neighbour
     */
    public static Result build(Ontology ontology, InformationContent ic, Map<String, List<String>> termIdsByCompound,
                               int k, int threads) {
        int[] unknown = new int[1];
        Map<String, int[]> resolved = CompoundTerms.resolve(ontology, termIdsByCompound, (compound, term) -> unknown[0]++);
        Map<String, int[]> withTerms = new LinkedHashMap<>();
        resolved.forEach((id, terms) -> {
            if (terms.length > 0) {
                withTerms.put(id, terms);
            }
        });
        CompoundSimilarity similarity = new CompoundSimilarity(new LinSimilarity(ontology, ic), Aggregation.MAX);
        NeighbourCache cache = NeighbourCache.build(withTerms, similarity,
                NeighbourCacheSettings.defaults().withK(k).withThreads(Math.max(1, threads)));
        return new Result(cache, termIdsByCompound.size() - withTerms.size(), unknown[0]);
    }

    /** The same with the intrinsic IC computed here. */
    public static Result build(Ontology ontology, Map<String, List<String>> termIdsByCompound, int k, int threads) {
        return build(ontology, SecoIntrinsicIc.compute(ontology), termIdsByCompound, k, threads);
    }
}
