package org.congener.streams.scoring;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.PriorityQueue;

import org.congener.schemas.SuggestionSource;
import org.congener.streams.state.GroupPopularity;

/**
 * Baseline until a model version is live: rank eligible compounds by their recency-weighted popularity
 * among the members of the researcher's group, p_g(j, t) (see {@link GroupPopularity}). Ties go to the
 * smaller compound id so that lists are reproducible.
 */
public final class GroupPopularityScorer implements SuggestionScorer {

    private static final Comparator<ScoredCandidate> BEST_FIRST =
            Comparator.comparingDouble(ScoredCandidate::fusedScore).reversed()
                    .thenComparing(ScoredCandidate::compoundId);

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
        PriorityQueue<ScoredCandidate> worstFirst = new PriorityQueue<>(BEST_FIRST.reversed());
        for (Map.Entry<String, GroupPopularity.Score> entry : input.group().scores().entrySet()) {
            String compoundId = entry.getKey();
            if (!input.eligible().eligible(compoundId)) {
                continue;
            }
            double popularity = input.group().at(compoundId, input.atEpochMs(), halfLifeMs);
            worstFirst.add(new ScoredCandidate(compoundId, 0, 0, popularity, List.of()));
            if (worstFirst.size() > n) {
                worstFirst.poll();
            }
        }
        List<ScoredCandidate> ranked = new ArrayList<>(worstFirst);
        ranked.sort(BEST_FIRST);
        return ranked;
    }
}
