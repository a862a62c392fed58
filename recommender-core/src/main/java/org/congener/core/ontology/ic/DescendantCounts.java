package org.congener.core.ontology.ic;

import org.congener.core.ontology.Ontology;

/**
 * Counts distinct descendants through the ancestor sets: every term adds one to each of its proper ancestors.
 * Because an ancestor set holds each ancestor once, a term reached by several paths is counted once, which a
 * sum over children would not do in a DAG.
 */
final class DescendantCounts {
    private DescendantCounts() {
    }

    static int[] descendants(Ontology ontology) {
        int[] counts = new int[ontology.size()];
        for (int t = 0; t < ontology.size(); t++) {
            for (int k = ontology.ancestorsFrom(t); k < ontology.ancestorsTo(t); k++) {
                int a = ontology.ancestorAt(k);
                if (a != t) {
                    counts[a]++;
                }
            }
        }
        return counts;
    }

    /** Leaves (nodes without children) strictly below each node; a leaf has none. */
    static int[] leavesBelow(Ontology ontology) {
        int[] counts = new int[ontology.size()];
        for (int t = 0; t < ontology.size(); t++) {
            if (ontology.childCount(t) != 0) {
                continue;
            }
            for (int k = ontology.ancestorsFrom(t); k < ontology.ancestorsTo(t); k++) {
                int a = ontology.ancestorAt(k);
                if (a != t) {
                    counts[a]++;
                }
            }
        }
        return counts;
    }
}
