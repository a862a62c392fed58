package org.congener.trainer.evaluation;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.congener.core.fusion.NeighbourLists;
import org.congener.core.interactions.IdIndex;
import org.congener.core.ontology.Ontology;
import org.congener.core.ontology.neighbours.CatalogueNeighbours;
import org.congener.core.ontology.neighbours.NeighbourCache;
import org.congener.schemas.Neighbour;

/**
 * The adapter between the ontology module and fusion: items mapped to ontology terms (from the
 * catalogue, or the item id itself when there is none), the ontology's neighbour cache of top-K
 * similar items (Lin on intrinsic IC after Seco, Veale &amp; Hayes 2004, best term pair), turned into
 * {@link NeighbourLists} over the experiment's item indexes.
 */
public final class OntologyNeighbours {
    private OntologyNeighbours() {
    }

    /** The lists plus how many items had no known term. */
    public record Result(NeighbourLists neighbours, int itemsWithoutTerms, int unknownTermIds) {
    }

    public static Result build(Ontology ontology, IdIndex items, Map<String, List<String>> catalogTerms, int k,
                               int threads) {
        Map<String, List<String>> termIds = new LinkedHashMap<>();
        for (String id : items.ids()) {
            termIds.put(id, catalogTerms == null ? List.of(id) : catalogTerms.getOrDefault(id, List.of()));
        }
        CatalogueNeighbours.Result built = CatalogueNeighbours.build(ontology, termIds, k, threads);
        return new Result(toNeighbourLists(built.cache(), items), built.compoundsWithoutTerms(), built.unknownTermIds());
    }

    /** The cache's lists re-indexed by {@code items}; neighbours outside {@code items} are dropped. */
    public static NeighbourLists toNeighbourLists(NeighbourCache cache, IdIndex items) {
        int n = items.size();
        int[][] ids = new int[n][];
        double[][] sims = new double[n][];
        for (int i = 0; i < n; i++) {
            List<Integer> keptIds = new ArrayList<>();
            List<Double> keptSims = new ArrayList<>();
            for (Neighbour neighbour : cache.neighbours(items.id(i))) {
                int j = items.indexOf(neighbour.compoundId());
                if (j >= 0 && j != i && neighbour.similarity() > 0) {
                    keptIds.add(j);
                    keptSims.add(neighbour.similarity());
                }
            }
            ids[i] = keptIds.stream().mapToInt(Integer::intValue).toArray();
            sims[i] = keptSims.stream().mapToDouble(Double::doubleValue).toArray();
        }
        return new NeighbourLists(ids, sims);
    }
}
