package org.congener.streams.scoring;

import java.util.ArrayList;
import java.util.List;

import org.congener.schemas.SuggestionSource;

/**
 * Ranks candidate compounds for one researcher. Implementations only score: the caller has already
 * updated the state with the triggering event, and {@link ScoringInput#eligible()} says which
 * compounds may be offered at all (authorisation, active, not already used), so every scorer filters
 * the same way.
 *
 * <p>Scoring comes in two steps so the stream can score several events together: {@link #begin} does,
 * in event order, what the researcher's next event depends on (the fold-in, whose vector that event
 * starts from); {@link #finish} ranks a run of begun events, sharing what it can between them.
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

    /** One event's scoring after {@link #begin}, waiting for {@link #finish}. */
    interface Begun {
        ScoringInput input();
    }

    /**
     * The part of scoring that must happen in event order, before the researcher's next event is
     * read; it may update the input's profile (which the caller then writes). Scorers without such
     * work only hold the input.
     */
    default Begun begin(ScoringInput input) {
        return () -> input;
    }

    /**
     * For each begun event, in the order given, the list {@link #rank} would give for its input. A
     * scorer that can share work between events (one pass over the item factors for all) overrides it.
     */
    default List<List<ScoredCandidate>> finish(List<? extends Begun> begun, int n) {
        List<List<ScoredCandidate>> lists = new ArrayList<>(begun.size());
        for (Begun event : begun) {
            lists.add(rank(event.input(), n));
        }
        return lists;
    }
}
