package org.congener.core.ontology;

import java.util.Collection;
import java.util.LinkedHashMap;
import java.util.Map;

/**
 * Turns a catalogue's term ids (strings, as catalogue entries carry them) into the dense ids that
 * {@code NeighbourCache} and {@code CompoundSimilarity} take. Alternative ids and replaced obsolete ids resolve
 * to their term; an id the ontology does not know is reported and left out, never silently dropped.
 */
public final class CompoundTerms {

    /** Told about every term id that could not be resolved. */
    @FunctionalInterface
    public interface UnknownTermListener {
        void unknownTerm(String compoundId, String termId);
    }

    private CompoundTerms() {
    }

    /**
     * @param termIdsByCompound compound id to its ontology term ids (not modified)
     * @return compound id to the distinct dense ids of its known terms, in the input's order; a compound whose
     *         terms are all unknown maps to an empty array
     */
    public static Map<String, int[]> resolve(Ontology ontology,
                                             Map<String, ? extends Collection<String>> termIdsByCompound,
                                             UnknownTermListener unknown) {
        Map<String, int[]> resolved = new LinkedHashMap<>(termIdsByCompound.size() * 2);
        GrowableIntArray terms = new GrowableIntArray(8);
        termIdsByCompound.forEach((compoundId, termIds) -> {
            terms.clear();
            for (String termId : termIds) {
                int term = ontology.termIndex(termId);
                if (term < 0) {
                    unknown.unknownTerm(compoundId, termId);
                } else {
                    terms.add(term);
                }
            }
            resolved.put(compoundId, java.util.Arrays.stream(terms.toArray()).sorted().distinct().toArray());
        });
        return resolved;
    }
}
