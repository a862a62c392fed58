package org.congener.core.ontology.io;

import java.nio.charset.StandardCharsets;
import java.util.HashMap;
import java.util.Locale;
import java.util.Map;

import org.congener.core.ontology.GrowableIntArray;
import org.congener.core.ontology.Ontology;

/**
 * The WordNet noun hierarchy: one term per synset (id = the 8-digit synset offset, name = its first lemma),
 * plus the senses of each lemma. The lemma index is built on the first look-up, so that loading the hierarchy
 * alone does not pay for 146,000 strings and map entries; until then the file's bytes are kept.
 */
public final class WordNetNouns {
    private final Ontology ontology;
    private final int[] lemmaStart;
    private final int[] lemmaEnd;
    private final int[] lemmaTerms;
    private byte[] source;
    private volatile Map<String, int[]> sensesByLemma;

    /**
     * @param source     the bytes of data.noun
     * @param lemmaStart where each lemma (one per word of a synset) starts in the bytes
     * @param lemmaEnd   where it ends (exclusive)
     * @param lemmaTerms the synset (dense term id) of each lemma
     */
    WordNetNouns(Ontology ontology, byte[] source, int[] lemmaStart, int[] lemmaEnd, int[] lemmaTerms) {
        this.ontology = ontology;
        this.source = source;
        this.lemmaStart = lemmaStart;
        this.lemmaEnd = lemmaEnd;
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
                    Map<String, GrowableIntArray> lists = new HashMap<>(lemmaTerms.length * 2);
                    for (int i = 0; i < lemmaTerms.length; i++) {
                        String lemma = new String(source, lemmaStart[i], lemmaEnd[i] - lemmaStart[i],
                                StandardCharsets.ISO_8859_1).toLowerCase(Locale.ROOT);
                        lists.computeIfAbsent(lemma, k -> new GrowableIntArray(2)).add(lemmaTerms[i]);
                    }
                    Map<String, int[]> built = new HashMap<>(lists.size() * 2);
                    lists.forEach((lemma, list) -> built.put(lemma, list.toArray()));
                    sensesByLemma = index = built;
                    source = null;
                }
            }
        }
        return index;
    }
}
