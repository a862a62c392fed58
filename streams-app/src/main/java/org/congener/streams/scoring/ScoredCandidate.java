package org.congener.streams.scoring;

import java.util.List;

import org.congener.schemas.Contribution;

/** One ranked candidate with the scores that placed it. */
public record ScoredCandidate(String compoundId, double cfScore, double semanticScore, double fusedScore,
                              List<Contribution> contributors) {
}
