package org.congener.streams.model;

import java.util.List;
import java.util.Optional;
import java.util.OptionalInt;

import org.congener.core.ontology.Ontology;
import org.congener.core.ontology.ic.SecoIntrinsicIc;
import org.congener.core.ontology.similarity.LinSimilarity;
import org.congener.core.ontology.similarity.SimilarityMeasure;

/**
 * The "why" of a suggestion in ontology terms: the most informative class that a suggested compound
 * shares with one of the researcher's past compounds — over all pairs of their annotated terms, the
 * common ancestor of highest information content (Resnik 1995's MICA; intrinsic IC of Seco, Veale &amp;
 * Hayes 2004, as the ontology module computes it). The virtual root says nothing and is never named.
 */
public final class SharedTerms {

    /** One ontology class with its name. */
    public record Term(String id, String name) {
    }

    private final Ontology ontology;
    private final SimilarityMeasure measure;

    public SharedTerms(Ontology ontology) {
        this.ontology = ontology;
        this.measure = new LinSimilarity(ontology, SecoIntrinsicIc.compute(ontology));
    }

    public Ontology ontology() {
        return ontology;
    }

    /** The intrinsic IC this instance computed once for the ontology. */
    public org.congener.core.ontology.ic.InformationContent informationContent() {
        return measure.informationContent();
    }

    /** The most informative class shared by the two term lists, or empty when they share none. */
    public Optional<Term> mostInformativeShared(List<String> termsOfSuggestion, List<String> termsOfPast) {
        int best = -1;
        double bestIc = 0;
        for (String a : termsOfSuggestion) {
            OptionalInt ia = ontology.findTerm(a);
            if (ia.isEmpty()) {
                continue;
            }
            for (String b : termsOfPast) {
                OptionalInt ib = ontology.findTerm(b);
                if (ib.isEmpty()) {
                    continue;
                }
                int mica = measure.mostInformativeCommonAncestor(ia.getAsInt(), ib.getAsInt());
                if (mica < 0 || ontology.isVirtualRoot(mica)) {
                    continue;
                }
                double ic = measure.informationContent().of(mica);
                if (best < 0 || ic > bestIc) {
                    best = mica;
                    bestIc = ic;
                }
            }
        }
        return best < 0 ? Optional.empty() : Optional.of(new Term(ontology.termId(best), ontology.name(best)));
    }
}
