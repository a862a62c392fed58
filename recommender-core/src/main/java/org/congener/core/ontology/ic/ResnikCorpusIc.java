package org.congener.core.ontology.ic;

import org.congener.core.ontology.Ontology;

/**
 * Corpus IC after Resnik (1995), "Using information content to evaluate semantic similarity in a taxonomy",
 * IJCAI-95, section 2:
 * <pre>freq(c) = Σ_{t : c ∈ ancestors(t)} count(t),   p(c) = freq(c) / freq(top),   IC(c) = −log p(c)</pre>
 * Each usage of a term counts once for every distinct ancestor (so multiple inheritance does not count a usage
 * twice at a shared ancestor). Terms never used would get an infinite IC; adding the same pseudo-count to every
 * term (Laplace smoothing, common practice) keeps IC finite and strictly falling towards the top.
 */
public final class ResnikCorpusIc {
    public static final String METHOD = "corpus-resnik";
    /** Pseudo-count added to each term's usage count (common practice: add-one). */
    public static final double DEFAULT_SMOOTHING = 1.0;

    private ResnikCorpusIc() {
    }

    /**
     * @param usageCounts usage count per dense term id (length {@code ontology.size()}), not modified
     * @param smoothing   pseudo-count per term, &gt; 0
     */
    public static InformationContent compute(Ontology ontology, double[] usageCounts, double smoothing) {
        if (usageCounts.length != ontology.size()) {
            throw new IllegalArgumentException("need one usage count per node: " + ontology.size()
                    + ", got " + usageCounts.length);
        }
        if (!(smoothing > 0) || !Double.isFinite(smoothing)) {
            throw new IllegalArgumentException("smoothing must be a finite number > 0, got " + smoothing);
        }
        int n = ontology.size();
        double[] freq = new double[n];
        for (int t = 0; t < n; t++) {
            double count = usageCounts[t];
            if (!(count >= 0) || !Double.isFinite(count)) {
                throw new IllegalArgumentException("usage count of " + ontology.termId(t) + " is " + count);
            }
            double weight = count + smoothing;
            for (int k = ontology.ancestorsFrom(t); k < ontology.ancestorsTo(t); k++) {
                freq[ontology.ancestorAt(k)] += weight;
            }
        }
        double total = freq[ontology.top()];
        double[] ic = new double[n];
        for (int c = 0; c < n; c++) {
            ic[c] = Math.max(0.0, -Math.log(freq[c] / total));
        }
        return new InformationContent(METHOD, ic);
    }
}
