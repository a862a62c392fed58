package org.congener.core.ontology.similarity;

import org.congener.core.ontology.Ontology;
import org.congener.core.ontology.ic.InformationContent;

/**
 * Resnik (1995), "Using information content to evaluate semantic similarity in a taxonomy", IJCAI-95:
 * sim(a, b) = IC(MICA(a, b)). Divided here by the largest IC of the ontology so that it lies in [0, 1]
 * like the other measures; the division changes no ranking and no correlation.
 */
public final class ResnikSimilarity extends IcMeasure {
    public static final String NAME = "resnik";

    public ResnikSimilarity(Ontology ontology, InformationContent ic) {
        super(ontology, ic);
    }

    @Override
    public String name() {
        return NAME;
    }

    @Override
    public double similarity(int a, int b) {
        double max = ic.max();
        return max == 0 ? 0.0 : ic.of(mostInformativeCommonAncestor(a, b)) / max;
    }

    @Override
    public double similarityThrough(int a, int b, int commonAncestor) {
        return upperBound(a, commonAncestor);
    }

    /** Resnik's value depends on the MICA alone. */
    @Override
    public double upperBound(int a, int commonAncestor) {
        double max = ic.max();
        return max == 0 ? 0.0 : ic.of(commonAncestor) / max;
    }
}
