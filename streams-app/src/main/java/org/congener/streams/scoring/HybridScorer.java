package org.congener.streams.scoring;

import java.util.ArrayList;
import java.util.List;

import org.congener.core.fusion.NeighbourLists;
import org.congener.core.fusion.OneResearcherScoring;
import org.congener.schemas.Contribution;
import org.congener.schemas.SuggestionSource;
import org.congener.streams.model.LiveModel;
import org.congener.streams.state.InteractionProfile;

/**
 * Under a live model version: the researcher's vector folded in exactly from their interaction
 * strengths, scored with the version's fusion rule ({@link OneResearcherScoring}, the same code a batch
 * top-N calls), filtered best-first. Before any version is live the fallback (group popularity) ranks,
 * and the list is flagged with the fallback's source and no version.
 */
public final class HybridScorer implements SuggestionScorer {

    /** How many of the researcher's past compounds a suggestion names as its reasons. */
    static final int CONTRIBUTORS = 3;

    private final SuggestionScorer coldStart;

    public HybridScorer(SuggestionScorer coldStart) {
        this.coldStart = coldStart;
    }

    @Override
    public SuggestionSource source() {
        return SuggestionSource.HYBRID;
    }

    @Override
    public SuggestionSource sourceFor(ScoringInput input) {
        return input.model() == null ? coldStart.sourceFor(input) : SuggestionSource.HYBRID;
    }

    @Override
    public String modelVersionFor(ScoringInput input) {
        return input.model() == null ? null : input.model().version();
    }

    @Override
    public List<ScoredCandidate> rank(ScoringInput input, int n) {
        LiveModel model = input.model();
        if (model == null) {
            return coldStart.rank(input, n);
        }
        Row row = Row.of(input.profile(), model, input.atEpochMs());
        OneResearcherScoring.Scores scores = OneResearcherScoring.score(model.foldIn(), model.itemFactors(),
                model.neighbours(), model.settings().fusion(), row.items, row.strengths);
        input.profile().keepVector(model.version(), scores.vector());
        int[] top = OneResearcherScoring.topN(scores.fused(), n,
                i -> input.eligible().eligible(model.compoundId(i)));
        List<ScoredCandidate> ranked = new ArrayList<>(top.length);
        for (int i : top) {
            ranked.add(new ScoredCandidate(model.compoundId(i), scores.cf()[i], scores.semantic()[i],
                    scores.fused()[i], contributors(model, row, i)));
        }
        return ranked;
    }

    /**
     * The researcher's past compounds j with the largest share sim(j, i) / n_u of the candidate's mean
     * semantic score, most first; compounds with no share are left out.
     */
    private static List<Contribution> contributors(LiveModel model, Row row, int candidate) {
        NeighbourLists lists = model.neighbours();
        int[] best = new int[CONTRIBUTORS];
        double[] share = new double[CONTRIBUTORS];
        int size = 0;
        for (int j : row.items) {
            double s = lists.similarity(j, candidate) / row.items.length;
            if (!(s > 0) || (size == CONTRIBUTORS && !(s > share[size - 1]))) {
                continue;
            }
            int p = size < CONTRIBUTORS ? size++ : size - 1;
            while (p > 0 && s > share[p - 1]) {
                best[p] = best[p - 1];
                share[p] = share[p - 1];
                p--;
            }
            best[p] = j;
            share[p] = s;
        }
        List<Contribution> out = new ArrayList<>(size);
        for (int t = 0; t < size; t++) {
            out.add(new Contribution(model.compoundId(best[t]), share[t]));
        }
        return out;
    }

    /** The researcher's interactions in the model's index; compounds the version does not know drop out. */
    private record Row(int[] items, double[] strengths) {
        /** Strengths read at {@code atEpochMs}, the triggering event's time, under the version's half-life. */
        static Row of(InteractionProfile profile, LiveModel model, long atEpochMs) {
            int[] items = new int[profile.size()];
            double[] strengths = new double[profile.size()];
            var halfLife = model.settings().weights().halfLife();
            double halfLifeMs = halfLife == null ? 0 : halfLife.toMillis();
            int n = 0;
            for (InteractionProfile.Entry e : profile.entries()) {
                int i = model.indexOf(e.compoundId());
                double strength = InteractionProfile.strengthAt(e, atEpochMs, halfLifeMs);
                if (i >= 0 && strength > 0) {
                    items[n] = i;
                    strengths[n++] = strength;
                }
            }
            return new Row(java.util.Arrays.copyOf(items, n), java.util.Arrays.copyOf(strengths, n));
        }
    }
}
