package org.congener.core.ontology.similarity;

import org.congener.core.ontology.Ontology;
import org.congener.core.ontology.ic.InformationContent;

/**
 * Jiang &amp; Conrath (1997), "Semantic similarity based on corpus statistics and lexical taxonomy", ROCLING X:
 * the distance dist(a, b) = IC(a) + IC(b) − 2·IC(MICA(a, b)), which lies in [0, 2·maxIC]. Turned into a
 * similarity by the linear transform sim = 1 − dist / (2·maxIC); with Seco's intrinsic IC (maxIC = 1) this is
 * the 1 − dist/2 that Seco, Veale &amp; Hayes (2004) used (from memory). A linear transform keeps Pearson's r with
 * human ratings equal to that of −dist.
 */
public final class JiangConrathSimilarity extends IcMeasure {
    public static final String NAME = "jc";

    public JiangConrathSimilarity(Ontology ontology, InformationContent ic) {
        super(ontology, ic);
    }

    @Override
    public String name() {
        return NAME;
    }

    @Override
    public double similarity(int a, int b) {
        if (a == b) {
            return 1.0;
        }
        double max = ic.max();
        if (max == 0) {
            return 1.0;
        }
        return similarityThrough(a, b, mostInformativeCommonAncestor(a, b));
    }

    @Override
    public double similarityThrough(int a, int b, int commonAncestor) {
        if (a == b) {
            return 1.0;
        }
        double max = ic.max();
        if (max == 0) {
            return 1.0;
        }
        double distance = ic.of(a) + ic.of(b) - 2.0 * ic.of(commonAncestor);
        return clamp(1.0 - distance / (2.0 * max));
    }

    /** IC(b) ≥ IC(m) for every b below m, so dist(a, b) ≥ IC(a) − IC(m). */
    @Override
    public double upperBound(int a, int commonAncestor) {
        double max = ic.max();
        if (max == 0) {
            return 1.0;
        }
        return clamp(1.0 - (ic.of(a) - ic.of(commonAncestor)) / (2.0 * max));
    }

    private static double clamp(double value) {
        return Math.max(0.0, Math.min(1.0, value));
    }
}
