package org.congener.core.ontology.similarity;

import org.congener.core.ontology.Ontology;
import org.congener.core.ontology.ic.InformationContent;

/**
 * Lin (1998), "An information-theoretic definition of similarity", ICML-98:
 * sim(a, b) = 2·IC(MICA(a, b)) / (IC(a) + IC(b)). A term is fully similar to itself, also where its IC is 0.
 */
public final class LinSimilarity extends IcMeasure {
    public static final String NAME = "lin";

    public LinSimilarity(Ontology ontology, InformationContent ic) {
        super(ontology, ic);
    }

    @Override
    public String name() {
        return NAME;
    }

    @Override
    public double similarity(int a, int b) {
        return similarityThrough(a, b, mostInformativeCommonAncestor(a, b));
    }

    @Override
    public double similarityThrough(int a, int b, int commonAncestor) {
        if (a == b) {
            return 1.0;
        }
        double denominator = ic.of(a) + ic.of(b);
        return denominator == 0 ? 0.0 : 2.0 * ic.of(commonAncestor) / denominator;
    }

    /** IC(b) ≥ IC(m) for every b below m, so sim(a, b) ≤ 2·IC(m) / (IC(a) + IC(m)). */
    @Override
    public double upperBound(int a, int commonAncestor) {
        double m = ic.of(commonAncestor);
        double denominator = ic.of(a) + m;
        return denominator == 0 ? 1.0 : 2.0 * m / denominator;
    }
}
