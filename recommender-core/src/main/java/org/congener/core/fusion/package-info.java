/**
 * Combining collaborative-filtering and semantic scores: the semantic score of a researcher for an
 * item from an {@link org.congener.core.fusion.ItemSimilarity}, fusion rules, and baselines. One
 * researcher is scored by {@link org.congener.core.fusion.ResearcherScoring} into a per-thread
 * {@link org.congener.core.fusion.ScoringWorkspace} (the stream) or fresh arrays
 * ({@link org.congener.core.fusion.OneResearcherScoring}, the batch path), by the same code. The
 * ontology enters only through {@code ItemSimilarity} and {@code NeighbourLists}.
 */
package org.congener.core.fusion;
