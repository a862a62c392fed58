package org.congener.core.fusion;

/** How the similarities of a candidate to a researcher's items I_u make one semantic score. */
public enum SemanticAggregation {
    /** mean over j ∈ I_u of sim(i, j) — DESIGN.md's default */
    MEAN,
    /** Σ_j r_uj sim(i, j) / Σ_j r_uj, weighting by interaction strength */
    WEIGHTED,
    /** max over j ∈ I_u of sim(i, j), the best-match variant */
    BEST_MATCH
}
