package org.congener.core.ontology.similarity;

import org.congener.core.ontology.Ontology;
import org.congener.core.ontology.ic.InformationContent;

/**
 * A similarity of two terms of one ontology, in [0, 1], symmetric, built on the information content of their
 * most informative common ancestor (MICA). Implementations are immutable and safe to share between threads.
 */
public interface SimilarityMeasure {

    /** Short name as written to {@code ItemNeighbours.measure}: {@code lin}, {@code resnik} or {@code jc}. */
    String name();

    Ontology ontology();

    InformationContent informationContent();

    /** Similarity of two terms (dense ids), in [0, 1]. */
    double similarity(int a, int b);

    /**
     * The common ancestor of a and b with the highest IC (a or b itself when one lies above the other); ties go
     * to the lower id, so the answer is the same whatever the argument order.
     */
    int mostInformativeCommonAncestor(int a, int b);

    /**
     * An upper bound on {@code similarity(a, b)} over every term b whose MICA with a is {@code commonAncestor}
     * (an ancestor of a). It uses only IC(b) ≥ IC(commonAncestor); the neighbour cache walks a's ancestors in
     * falling bound order and stops once the bound cannot beat the K-th best similarity found.
     */
    double upperBound(int a, int commonAncestor);

    /**
     * The similarity a and b would have if {@code commonAncestor} (an ancestor of both) were their MICA: never
     * above {@code similarity(a, b)}, and equal to it when commonAncestor is a MICA. Lets a search that meets b
     * through several common ancestors of a keep the best value in O(1) each, with no merge of ancestor sets.
     */
    double similarityThrough(int a, int b, int commonAncestor);
}
