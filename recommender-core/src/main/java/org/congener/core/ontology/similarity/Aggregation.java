package org.congener.core.ontology.similarity;

/** How term similarities combine when a compound maps to several ontology terms. */
public enum Aggregation {
    /** The best pair: max over a ∈ A, b ∈ B of sim(a, b). */
    MAX,
    /**
     * Best-match average, as reviewed by Pesquita et al. (2009), "Semantic similarity in biomedical
     * ontologies", PLoS Comput Biol 5(7): e1000443 (from memory):
     * ½·(mean over a ∈ A of max over b ∈ B of sim(a, b) + mean over b ∈ B of max over a ∈ A of sim(a, b)).
     * Never above {@link #MAX}.
     */
    BEST_MATCH_AVERAGE
}
