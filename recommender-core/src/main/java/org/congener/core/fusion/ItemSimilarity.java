package org.congener.core.fusion;

/** Similarity of two items by their meaning (e.g. Lin similarity of their ontology terms), in [0, 1]. */
@FunctionalInterface
public interface ItemSimilarity {
    double similarity(int itemA, int itemB);
}
