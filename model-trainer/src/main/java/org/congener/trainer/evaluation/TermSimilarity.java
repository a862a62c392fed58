package org.congener.trainer.evaluation;

/**
 * What the experiment needs from an ontology: term look-up and a similarity of two terms in [0, 1].
 * {@link EdgeListTaxonomy} implements it today; the ontology module's similarity measure plugs in
 * through a small adapter of this shape.
 */
public interface TermSimilarity {
    /** Index of a term id, or −1 when unknown. */
    int indexOf(String termId);

    double similarity(int termA, int termB);

    int termCount();
}
