package org.congener.core.ontology.ic;

import org.congener.core.ontology.Ontology;

/**
 * Intrinsic IC after Sánchez, Batet &amp; Isern (2011), "Ontology-based information content computation",
 * Knowledge-Based Systems 24(2):297–303 (formula as we recall it from the paper, from memory):
 * <pre>IC(a) = −log( (|leaves(a)| / |subsumers(a)| + 1) / (max_leaves + 1) )</pre>
 * with leaves(a) the leaves below a, subsumers(a) the ancestors of a including a itself, and max_leaves the
 * number of leaves of the ontology. Unlike Seco's count of all descendants it rewards terms that sit deep
 * (many subsumers) and whose subtree spreads little (few leaves), which suits ontologies with multiple
 * inheritance. A leaf has IC log(max_leaves + 1), the top node 0.
 */
public final class SanchezIntrinsicIc {
    public static final String METHOD = "intrinsic-sanchez";

    private SanchezIntrinsicIc() {
    }

    public static InformationContent compute(Ontology ontology) {
        int n = ontology.size();
        int[] leaves = DescendantCounts.leavesBelow(ontology);
        int maxLeaves = 0;
        for (int t = 0; t < n; t++) {
            if (ontology.childCount(t) == 0) {
                maxLeaves++;
            }
        }
        double[] ic = new double[n];
        for (int a = 0; a < n; a++) {
            double ratio = (double) leaves[a] / ontology.ancestorCount(a);
            ic[a] = Math.max(0.0, -Math.log((ratio + 1.0) / (maxLeaves + 1.0)));
        }
        return new InformationContent(METHOD, ic);
    }
}
