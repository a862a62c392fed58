package org.congener.core.ontology.ic;

import org.congener.core.ontology.Ontology;

/**
 * Intrinsic IC after Seco, Veale &amp; Hayes (2004), "An intrinsic information content metric for semantic
 * similarity in WordNet", ECAI 2004:
 * <pre>IC(c) = 1 − log(hypo(c) + 1) / log(N)</pre>
 * with hypo(c) the number of distinct descendants of c and N the number of concepts. Here N counts every node,
 * the virtual root included, so the top node has IC 0 and every leaf IC 1.
 */
public final class SecoIntrinsicIc {
    public static final String METHOD = "intrinsic-seco";

    private SecoIntrinsicIc() {
    }

    public static InformationContent compute(Ontology ontology) {
        int n = ontology.size();
        int[] hypo = DescendantCounts.descendants(ontology);
        double logN = Math.log(n);
        double[] ic = new double[n];
        for (int c = 0; c < n; c++) {
            ic[c] = hypo[c] == 0 ? 1.0 : Math.max(0.0, 1.0 - Math.log(hypo[c] + 1.0) / logN);
        }
        return new InformationContent(METHOD, ic);
    }
}
