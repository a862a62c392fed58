package org.congener.streams.scoring;

import java.util.List;

import org.congener.schemas.Contribution;

/** One ranked candidate with the scores that placed it. */
public record ScoredCandidate(String compoundId, double cfScore, double semanticScore, double fusedScore,
                              List<Contribution> contributors) {

    /** Fused score descending, ties to the smaller compound id, so that lists are reproducible. */
    static final java.util.Comparator<ScoredCandidate> BEST_FIRST =
            java.util.Comparator.comparingDouble(ScoredCandidate::fusedScore).reversed()
                    .thenComparing(ScoredCandidate::compoundId);

    /**
     * The best {@code n} of {@code all} that {@code eligible} accepts. Everything is scored first
     * (cheap), then eligibility is checked best-first until n are found: the check reads the
     * catalogue, which costs far more than the arithmetic. Sorts {@code all}.
     */
    static List<ScoredCandidate> bestEligible(List<ScoredCandidate> all, int n, CandidateFilter eligible) {
        all.sort(BEST_FIRST);
        List<ScoredCandidate> ranked = new java.util.ArrayList<>(Math.min(n, all.size()));
        for (ScoredCandidate candidate : all) {
            if (ranked.size() == n) {
                break;
            }
            if (eligible.eligible(candidate.compoundId())) {
                ranked.add(candidate);
            }
        }
        return ranked;
    }
}
