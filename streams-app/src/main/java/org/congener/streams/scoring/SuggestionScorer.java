package org.congener.streams.scoring;

import java.util.List;

import org.congener.schemas.SuggestionSource;

/**
 * Ranks candidate compounds for one researcher. Implementations only score: the caller has already
 * updated the state with the triggering event, and {@link ScoringInput#eligible()} says which
 * compounds may be offered at all (authorisation, active, not already used), so every scorer filters
 * the same way.
 */
public interface SuggestionScorer {

    /** What the lists of this scorer are, for {@code Suggestions.source}. */
    SuggestionSource source();

    /** The model version that scores, or null when no model is involved. */
    default String modelVersion() {
        return null;
    }

    /** The source for one input; a scorer that depends on the live model decides per snapshot. */
    default SuggestionSource sourceFor(ScoringInput input) {
        return source();
    }

    /** The version for one input, or null when no model scored it. */
    default String modelVersionFor(ScoringInput input) {
        return modelVersion();
    }

    /** At most {@code n} eligible candidates, best first. */
    List<ScoredCandidate> rank(ScoringInput input, int n);
}
