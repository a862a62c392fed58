package org.congener.core.ontology.io;

import java.util.HashMap;
import java.util.Locale;
import java.util.Map;

import org.congener.core.ontology.GrowableIntArray;
import org.congener.core.ontology.Ontology;

/**
 * The WordNet noun hierarchy: one term per synset (id = the 8-digit synset offset, name = its first lemma),
 * plus the senses of each lemma. The lemma index is built on the first look-up, so that loading the hierarchy
 * alone does not pay for 146,000 map entries.
 */
public final class WordNetNouns {
    private final Ontology ontology;
    private final String[] lemmas;
    private final int[] lemmaTerms;
    private volatile Map<String, int[]> sensesByLemma;

    /**
     * @param lemmas     lower-case lemmas (multi-word lemmas keep WordNet's underscores), one per word of a synset
     * @param lemmaTerms the synset (dense term id) of each lemma
     */
    WordNetNouns(Ontology ontology, String[] lemmas, int[] lemmaTerms) {
        this.ontology = ontology;
        this.lemmas = lemmas;
        this.lemmaTerms = lemmaTerms;
    }

    public Ontology ontology() {
        return ontology;
    }

    /** The synsets of a word, case-insensitive, spaces read as underscores; empty when WordNet has no noun sense. */
    public int[] senses(String word) {
        int[] senses = index().get(word.toLowerCase(Locale.ROOT).replace(' ', '_'));
        return senses == null ? new int[0] : senses.clone();
    }

    private Map<String, int[]> index() {
        Map<String, int[]> index = sensesByLemma;
        if (index == null) {
            synchronized (this) {
                index = sensesByLemma;
                if (index == null) {
                    Map<String, GrowableIntArray> lists = new HashMap<>(lemmas.length * 2);
                    for (int i = 0; i < lemmas.length; i++) {
                        lists.computeIfAbsent(lemmas[i], k -> new GrowableIntArray(2)).add(lemmaTerms[i]);
                    }
                    Map<String, int[]> built = new HashMap<>(lists.size() * 2);
                    lists.forEach((lemma, list) -> built.put(lemma, list.toArray()));
                    sensesByLemma = index = built;
                }
            }
        }
        return index;
    }
}
