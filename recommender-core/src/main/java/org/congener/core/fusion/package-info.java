/**
 * Combining collaborative-filtering and semantic scores: the semantic score of a researcher for an
 * item from an {@link org.congener.core.fusion.ItemSimilarity}, fusion rules, and baselines. The
 * ontology enters only through {@code ItemSimilarity} and {@code NeighbourLists}.
 */
package org.congener.core.fusion;
