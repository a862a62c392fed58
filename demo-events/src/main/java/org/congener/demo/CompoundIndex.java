package org.congener.demo;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Which active catalogue compounds fall under which ontology term (through {@code is_a} from any of
 * their terms). Compounds are referred to by their position in the catalogue.
 */
final class CompoundIndex {

    private final List<SourceCompound> compounds;
    private final Map<String, List<Integer>> underTerm = new LinkedHashMap<>();
    private final List<Set<String>> ancestors = new ArrayList<>();

    CompoundIndex(List<SourceCompound> compounds, DemoOntology ontology) {
        this.compounds = compounds;
        for (int i = 0; i < compounds.size(); i++) {
            Set<String> all = new LinkedHashSet<>();
            for (String term : compounds.get(i).termIds()) {
                all.addAll(ontology.ancestorsOrSelf(term));
            }
            ancestors.add(all);
            if (compounds.get(i).active()) {
                for (String term : all) {
                    underTerm.computeIfAbsent(term, k -> new ArrayList<>()).add(i);
                }
            }
        }
    }

    List<SourceCompound> compounds() {
        return compounds;
    }

    SourceCompound compound(int index) {
        return compounds.get(index);
    }

    int size() {
        return compounds.size();
    }

    /** Active compounds under the term, in catalogue order. */
    List<Integer> under(String termId) {
        return underTerm.getOrDefault(termId, List.of());
    }

    /** Every term the compound falls under. */
    Set<String> ancestorsOf(int index) {
        return ancestors.get(index);
    }
}
