package org.congener.streams.scoring;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import org.congener.schemas.SuggestionSource;
import org.congener.streams.state.GroupPopularity;

/**
 * Baseline until a model version is live: rank eligible compounds by their recency-weighted popularity
 * among the members of the researcher's group, p_g(j, t) (see {@link GroupPopularity}). Ties go to the
 * smaller compound id so that lists are reproducible.
 */
public final class GroupPopularityScorer implements SuggestionScorer {

    private final double halfLifeMs;

    public GroupPopularityScorer(double halfLifeMs) {
        if (!(halfLifeMs > 0)) {
            throw new IllegalArgumentException("half-life must be positive, got " + halfLifeMs);
        }
        this.halfLifeMs = halfLifeMs;
    }

    @Override
    public SuggestionSource source() {
        return SuggestionSource.POPULARITY;
    }

    @Override
    public List<ScoredCandidate> rank(ScoringInput input, int n) {
        if (input.group() == null) {
            return List.of();
        }
        List<ScoredCandidate> all = new ArrayList<>(input.group().size());
        for (Map.Entry<String, GroupPopularity.Score> entry : input.group().scores().entrySet()) {
            double popularity = input.group().at(entry.getKey(), input.atEpochMs(), halfLifeMs);
            all.add(new ScoredCandidate(entry.getKey(), 0, 0, popularity, List.of()));
        }
        return ScoredCandidate.bestEligible(all, n, input.eligible());
    }
}
