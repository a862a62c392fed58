package org.congener.core.ontology.similarity;

import org.congener.core.ontology.Ontology;
import org.congener.core.ontology.ic.InformationContent;

/** What every IC-based measure shares: the ontology, its IC, and the MICA search. */
abstract class IcMeasure implements SimilarityMeasure {
    protected final Ontology ontology;
    protected final InformationContent ic;

    IcMeasure(Ontology ontology, InformationContent ic) {
        if (ic.size() != ontology.size()) {
            throw new IllegalArgumentException("information content has " + ic.size()
                    + " values for an ontology of " + ontology.size() + " nodes");
        }
        this.ontology = ontology;
        this.ic = ic;
    }

    @Override
    public Ontology ontology() {
        return ontology;
    }

    @Override
    public InformationContent informationContent() {
        return ic;
    }

    @Override
    public int mostInformativeCommonAncestor(int a, int b) {
        return MostInformativeCommonAncestor.find(ontology, ic, a, b);
    }

    @Override
    public String toString() {
        return name() + "/" + ic.method();
    }
}
