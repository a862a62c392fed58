package org.congener.streams.scoring;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import org.congener.schemas.Contribution;
import org.congener.schemas.Neighbour;
import org.congener.schemas.SuggestionSource;
import org.congener.streams.state.InteractionProfile;

/**
 * Ranks before any model version is live. With the ontology's neighbour lists at hand
 * ({@link ScoringInput#similar()}), a candidate c scores
 * <pre>
 *   w · sem(u, c) / max sem  +  (1 − w) · pop_g(c, t) / max pop
 * </pre>
 * where sem(u, c) = (1/n_u) Σ_{j ∈ I_u} sim(j, c) is the design's mean semantic score over the
 * researcher's past compounds (sim from j's top-K list, 0 when c is not on it) and pop_g is the
 * recency-weighted popularity among the researcher's group ({@link GroupPopularityScorer}); both are
 * divided by their largest value over the candidates so that neither scale dominates. No offline
 * evaluation picks w before a model exists; an even split (w = 0.5) is common practice for an untuned
 * linear blend. Without neighbour lists (no ontology configured) the group popularity alone ranks.
 * Ties go to the smaller compound id, so lists are reproducible.
 */
public final class ColdStartScorer implements SuggestionScorer {

    static final double SEMANTIC_WEIGHT = 0.5;

    private final GroupPopularityScorer popularity;
    private final double halfLifeMs;

    public ColdStartScorer(double halfLifeMs) {
        this.popularity = new GroupPopularityScorer(halfLifeMs);
        this.halfLifeMs = halfLifeMs;
    }

    @Override
    public SuggestionSource source() {
        return SuggestionSource.SEMANTIC_AND_POPULARITY;
    }

    @Override
    public SuggestionSource sourceFor(ScoringInput input) {
        return input.similar() == null ? popularity.source() : source();
    }

    @Override
    public List<ScoredCandidate> rank(ScoringInput input, int n) {
        if (input.similar() == null) {
            return popularity.rank(input, n);
        }
        InteractionProfile profile = input.profile();
        int history = 0;
        Map<String, double[]> semantic = new HashMap<>();
        Map<String, List<Contribution>> because = new HashMap<>();
        for (InteractionProfile.Entry past : profile.entries()) {
            if (!(past.strength() > 0)) {
                continue;
            }
            history++;
            for (Neighbour near : input.similar().of(past.compoundId())) {
                semantic.computeIfAbsent(near.compoundId(), c -> new double[1])[0] += near.similarity();
                because.computeIfAbsent(near.compoundId(), c -> new ArrayList<>())
                        .add(new Contribution(past.compoundId(), near.similarity()));
            }
        }
        Map<String, Double> pop = new HashMap<>();
        if (input.group() != null) {
            input.group().scores().keySet().forEach(c -> pop.put(c, input.group().at(c, input.atEpochMs(), halfLifeMs)));
        }
        double maxSemantic = 0;
        for (double[] s : semantic.values()) {
            maxSemantic = Math.max(maxSemantic, s[0] / history);
        }
        double maxPopularity = 0;
        for (double p : pop.values()) {
            maxPopularity = Math.max(maxPopularity, p);
        }
        List<ScoredCandidate> all = new ArrayList<>(semantic.size() + pop.size());
        for (String c : union(semantic.keySet(), pop.keySet())) {
            double sem = semantic.containsKey(c) ? semantic.get(c)[0] / history : 0;
            double p = pop.getOrDefault(c, 0.0);
            double fused = SEMANTIC_WEIGHT * (maxSemantic > 0 ? sem / maxSemantic : 0)
                    + (1 - SEMANTIC_WEIGHT) * (maxPopularity > 0 ? p / maxPopularity : 0);
            all.add(new ScoredCandidate(c, 0, sem, fused, contributors(because.get(c), history)));
        }
        return ScoredCandidate.bestEligible(all, n, input.eligible());
    }

    private static List<String> union(java.util.Set<String> a, java.util.Set<String> b) {
        java.util.Set<String> all = new java.util.TreeSet<>(a);
        all.addAll(b);
        return new ArrayList<>(all);
    }

    /** The past compounds behind a candidate's semantic score, each with its share sim/n_u of the mean, largest first. */
    private static List<Contribution> contributors(List<Contribution> raw, int history) {
        if (raw == null) {
            return List.of();
        }
        return raw.stream()
                .map(c -> new Contribution(c.compoundId(), c.weight() / history))
                .sorted(Comparator.comparingDouble(Contribution::weight).reversed().thenComparing(Contribution::compoundId))
                .limit(HybridScorer.CONTRIBUTORS)
                .toList();
    }
}
