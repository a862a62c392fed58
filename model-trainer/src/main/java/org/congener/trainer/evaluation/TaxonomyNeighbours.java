package org.congener.trainer.evaluation;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.congener.core.fusion.ItemSimilarity;
import org.congener.core.fusion.NeighbourLists;
import org.congener.core.interactions.IdIndex;

/**
 * Items mapped to taxonomy terms (from the catalogue, or the item id itself when there is no
 * catalogue) and their similarity: the best Lin similarity over their term pairs (the best-match
 * convention for multi-term entities, common practice).
 */
public final class TaxonomyNeighbours {
    private TaxonomyNeighbours() {
    }

    /** Result: the neighbour lists plus how many items had no term in the taxonomy. */
    public record Result(NeighbourLists neighbours, int itemsWithoutTerms) {
    }

    public static Result build(TermSimilarity taxonomy, IdIndex items, Map<String, List<String>> catalogTerms,
                               int topK) {
        int n = items.size();
        int[][] termsOf = new int[n][];
        int missing = 0;
        for (int i = 0; i < n; i++) {
            String id = items.id(i);
            List<String> names = catalogTerms == null ? List.of(id) : catalogTerms.getOrDefault(id, List.of());
            List<Integer> found = new ArrayList<>();
            for (String name : names) {
                int t = taxonomy.indexOf(name);
                if (t >= 0) {
                    found.add(t);
                }
            }
            termsOf[i] = found.stream().mapToInt(Integer::intValue).toArray();
            if (termsOf[i].length == 0) {
                missing++;
            }
        }
        ItemSimilarity similarity = (a, b) -> {
            double best = 0;
            for (int ta : termsOf[a]) {
                for (int tb : termsOf[b]) {
                    best = Math.max(best, taxonomy.similarity(ta, tb));
                }
            }
            return best;
        };
        return new Result(NeighbourLists.fromSimilarity(similarity, n, topK), missing);
    }
}
