package org.congener.core.ontology.io;

import java.util.Map;

import org.congener.core.ontology.Ontology;

/**
 * The WordNet noun hierarchy: one term per synset (id = the 8-digit synset offset, name = its first lemma),
 * plus the senses of each lemma.
 *
 * @param sensesByLemma lower-case lemma (multi-word lemmas keep WordNet's underscores) to its synsets
 */
public record WordNetNouns(Ontology ontology, Map<String, int[]> sensesByLemma) {

    /** The synsets of a word, case-insensitive; empty when WordNet has no noun sense for it. */
    public int[] senses(String word) {
        int[] senses = sensesByLemma.get(word.toLowerCase(java.util.Locale.ROOT).replace(' ', '_'));
        return senses == null ? new int[0] : senses.clone();
    }
}
