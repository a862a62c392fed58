package org.congener.bench.ontology;

import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.SplittableRandom;

import org.congener.core.ontology.Ontology;
import org.congener.core.ontology.OntologyBuilder;

/**
 * Generated inputs for the neighbour-cache benchmark. The DAG is a random recursive tree (each term takes a
 * parent uniformly among the terms before it, which gives logarithmic depth like curated ontologies) with a
 * second, also uniform, parent for a given share of terms: multiple inheritance as in chemical-entity
 * ontologies. Compounds map to one to three uniformly drawn terms.
 */
public final class SyntheticCatalogue {
    private SyntheticCatalogue() {
    }

    public static Ontology dag(int terms, double secondParentShare, long seed) {
        SplittableRandom random = new SplittableRandom(seed);
        OntologyBuilder builder = new OntologyBuilder();
        for (int t = 0; t < terms; t++) {
            builder.addTerm("SYN:" + t, null, 0);
            if (t == 0) {
                continue;
            }
            int first = random.nextInt(t);
            builder.addEdge(t, first, 0);
            if (t > 1 && random.nextDouble() < secondParentShare) {
                int second = random.nextInt(t);
                if (second != first) {
                    builder.addEdge(t, second, 0);
                }
            }
        }
        return builder.build();
    }

    public static Map<String, int[]> compounds(Ontology ontology, int count, long seed) {
        SplittableRandom random = new SplittableRandom(seed);
        Map<String, int[]> catalogue = new LinkedHashMap<>();
        for (int c = 0; c < count; c++) {
            int[] terms = new int[1 + random.nextInt(3)];
            for (int i = 0; i < terms.length; i++) {
                terms[i] = random.nextInt(ontology.termCount());
            }
            catalogue.put(String.format("SYN-CMP-%06d", c), Arrays.stream(terms).sorted().distinct().toArray());
        }
        return catalogue;
    }
}
