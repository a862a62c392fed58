package org.congener.streams.scoring;

import java.util.ArrayList;
import java.util.List;

import org.congener.core.fusion.NeighbourLists;
import org.congener.core.fusion.ResearcherScoring;
import org.congener.core.fusion.ScoringBatch;
import org.congener.core.fusion.ScoringWorkspace;
import org.congener.schemas.Contribution;
import org.congener.schemas.SuggestionSource;
import org.congener.streams.model.LiveModel;
import org.congener.streams.state.InteractionProfile;

/**
 * Under a live model version: the researcher's vector folded in from their interaction strengths —
 * exactly at their first event under the version, then by conjugate gradient run to convergence from
 * the vector kept in their profile (the warm start of the design) — scored with the version's fusion
 * rule through {@link ResearcherScoring} (the code the batch top-N of {@link
 * org.congener.core.fusion.OneResearcherScoring} runs too) into this thread's reused workspace, and
 * filtered best-first. Before any version is live the cold-start scorer ranks, and the list is
 * flagged with its source and no version.
 */
public final class HybridScorer implements SuggestionScorer {

    /** How many of the researcher's past compounds a suggestion names as its reasons. */
    static final int CONTRIBUTORS = 3;

    private final SuggestionScorer coldStart;
    /**
     * Events whose CF scores share one pass over the factors. 32 columns of 10,000 scores are 2.6 MB,
     * about the factors' own size as floats; more would stream the scores through memory instead.
     */
    static final int BATCH_COLUMNS = 32;
    /** One workspace per stream thread (item-count doubles ×4), resized when a version of another size goes live. */
    private final ThreadLocal<ScoringWorkspace> workspaces = new ThreadLocal<>();
    /** One batch per stream thread, kept like the workspace. */
    private final ThreadLocal<ScoringBatch> batches = new ThreadLocal<>();
    /** Per stream thread: item → 1 + its place in the list being explained, 0 elsewhere. */
    private final ThreadLocal<int[]> slotArrays = new ThreadLocal<>();

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

    /** Begun under a live version: the history in the version's index and the folded vector x_u. */
    private record Folded(ScoringInput input, Row row, double[] x) implements Begun {
    }

    /**
     * Folds in x_u and keeps it in the profile for the researcher's next event; before any version is
     * live, the cold-start scorer's step.
     */
    @Override
    public Begun begin(ScoringInput input) {
        LiveModel model = input.model();
        if (model == null) {
            return coldStart.begin(input);
        }
        Row row = Row.of(input.profile(), model, input.atEpochMs());
        ResearcherScoring scoring = model.scoring();
        ScoringWorkspace ws = workspace(scoring);
        scoring.foldIn(row.items, row.strengths, warmStart(input.profile().vectorUnder(model.version())), ws);
        double[] x = new double[scoring.rank()];
        ws.copyVector(x);
        input.profile().keepVector(model.version(), x);
        return new Folded(input, row, x);
    }

    @Override
    public List<ScoredCandidate> rank(ScoringInput input, int n) {
        return finish(List.of(begin(input)), n).get(0);
    }

    /**
     * Runs of consecutive events under one version are scored together: their CF scores come from one
     * pass over the version's factors ({@link ResearcherScoring#multiplyBatch}), each the same bits as
     * alone, then each event is fused and filtered on its own.
     */
    @Override
    public List<List<ScoredCandidate>> finish(List<? extends Begun> begun, int n) {
        List<List<ScoredCandidate>> lists = new ArrayList<>(begun.size());
        int start = 0;
        while (start < begun.size()) {
            if (!(begun.get(start) instanceof Folded first)) {
                lists.add(coldStart.rank(begun.get(start).input(), n));
                start++;
                continue;
            }
            LiveModel model = first.input().model();
            ResearcherScoring scoring = model.scoring();
            ScoringWorkspace ws = workspace(scoring);
            ScoringBatch batch = batch(scoring);
            batch.clear();
            int end = start;
            while (end < begun.size() && !batch.isFull() && begun.get(end) instanceof Folded next
                    && next.input().model() == model) {
                batch.add(next.x());
                end++;
            }
            scoring.multiplyBatch(batch, ws);
            for (int t = start; t < end; t++) {
                Folded event = (Folded) begun.get(t);
                scoring.scoreColumn(batch, t - start, event.row().items, event.row().strengths, ws);
                lists.add(ranked(event, ws, n));
            }
            start = end;
        }
        return lists;
    }

    private List<ScoredCandidate> ranked(Folded event, ScoringWorkspace ws, int n) {
        LiveModel model = event.input().model();
        int[] top = eligibleTop(ws, n, i -> event.input().eligible().eligible(model.compoundId(i)));
        List<List<Contribution>> reasons = contributors(model.neighbours(), model::compoundId, event.row().history, top,
                candidateSlots(model.itemCount()));
        List<ScoredCandidate> ranked = new ArrayList<>(top.length);
        for (int t = 0; t < top.length; t++) {
            int i = top[t];
            ranked.add(new ScoredCandidate(model.compoundId(i), ws.cf(i), ws.semantic(i), ws.fused(i), reasons.get(t)));
        }
        return ranked;
    }

    /** This thread's workspace, replaced when a version of another size goes live. */
    private ScoringWorkspace workspace(ResearcherScoring scoring) {
        ScoringWorkspace ws = scoring.workspaceFor(workspaces.get());
        workspaces.set(ws);
        return ws;
    }

    /** This thread's batch of {@link #BATCH_COLUMNS} columns, replaced when a version of another size goes live. */
    private ScoringBatch batch(ResearcherScoring scoring) {
        ScoringBatch batch = batches.get();
        if (batch == null || !batch.fits(scoring.itemCount(), scoring.rank())) {
            batch = scoring.newBatch(BATCH_COLUMNS);
            batches.set(batch);
        }
        return batch;
    }

    /**
     * The best {@code n} eligible items, best first, ties to the smaller index: the same list as
     * {@code ws.topN(n, eligible)}. The eligibility check reads the catalogue and the researcher's
     * authorisations, so it is run on the head of the ranking first: when the best 2n + 8 items
     * regardless of eligibility hold n eligible ones, those are the answer (every item further down
     * ranks below all of them); only otherwise the full scan checks as it goes.
     */
    static int[] eligibleTop(ScoringWorkspace ws, int n, java.util.function.IntPredicate eligible) {
        int[] head = ws.topN(2 * n + 8, i -> true);
        int[] top = new int[n];
        int found = 0;
        for (int t = 0; t < head.length && found < n; t++) {
            if (eligible.test(head[t])) {
                top[found++] = head[t];
            }
        }
        if (found == n) {
            return top;
        }
        return ws.topN(n, eligible);
    }

    /** The kept vector widened for the solver, or null (no vector under this version: exact fold-in). */
    private static double[] warmStart(float[] kept) {
        if (kept == null) {
            return null;
        }
        double[] x = new double[kept.length];
        for (int f = 0; f < kept.length; f++) {
            x[f] = kept[f];
        }
        return x;
    }

    /**
     * For each listed candidate i, the researcher's past compounds j with the largest share
     * sim(j, i) / n_u of its mean semantic score, most first, ties to the earlier compound of the
     * history; compounds with no share are left out. One pass over the history's neighbour lists
     * serves every candidate (n_u·K steps instead of a look-up per candidate and past compound); sim(j, i)
     * is the first entry for i in j's list, as {@link NeighbourLists#similarity} reads it.
     *
     * @param slotOf all zero, one entry per item; zero again on return
     */
    static List<List<Contribution>> contributors(NeighbourLists lists, java.util.function.IntFunction<String> compoundId,
                                                 int[] history, int[] top, int[] slotOf) {
        for (int t = 0; t < top.length; t++) {
            slotOf[top[t]] = t + 1;
        }
        int[][] best = new int[top.length][CONTRIBUTORS];
        double[][] share = new double[top.length][CONTRIBUTORS];
        int[] size = new int[top.length];
        int[] lastFrom = new int[top.length];
        java.util.Arrays.fill(lastFrom, -1);
        for (int p = 0; p < history.length; p++) {
            int j = history[p];
            int[] ids = lists.neighbours(j);
            double[] sims = lists.similarities(j);
            for (int t = 0; t < ids.length; t++) {
                int slot = slotOf[ids[t]] - 1;
                if (slot < 0 || lastFrom[slot] == p) {
                    continue;
                }
                lastFrom[slot] = p;
                keepIfAmongBest(best[slot], share[slot], size, slot, j, sims[t] / history.length);
            }
        }
        for (int i : top) {
            slotOf[i] = 0;
        }
        List<List<Contribution>> out = new ArrayList<>(top.length);
        for (int slot = 0; slot < top.length; slot++) {
            List<Contribution> reasons = new ArrayList<>(size[slot]);
            for (int t = 0; t < size[slot]; t++) {
                reasons.add(new Contribution(compoundId.apply(best[slot][t]), share[slot][t]));
            }
            out.add(reasons);
        }
        return out;
    }

    /** Inserts (j, s) into one candidate's best-first list of at most {@link #CONTRIBUTORS}; s ≤ 0 is no share. */
    private static void keepIfAmongBest(int[] best, double[] share, int[] sizes, int slot, int j, double s) {
        int size = sizes[slot];
        if (!(s > 0) || (size == CONTRIBUTORS && !(s > share[size - 1]))) {
            return;
        }
        int p = size < CONTRIBUTORS ? size++ : size - 1;
        while (p > 0 && s > share[p - 1]) {
            best[p] = best[p - 1];
            share[p] = share[p - 1];
            p--;
        }
        best[p] = j;
        share[p] = s;
        sizes[slot] = size;
    }

    /** This thread's candidate-slot array (all zero between calls), sized to the catalogue. */
    private int[] candidateSlots(int items) {
        int[] slots = slotArrays.get();
        if (slots == null || slots.length != items) {
            slots = new int[items];
            slotArrays.set(slots);
        }
        return slots;
    }

    /**
     * The researcher's interactions in the model's index, in index order (the order the scorer sums
     * them in, so its fold-in and its scoring need not sort them again); compounds the version does not
     * know drop out. {@code history} holds the same items in the profile's order, which the reasons'
     * ties follow.
     */
    private record Row(int[] items, double[] strengths, int[] history) {
        /** Strengths read at {@code atEpochMs}, the triggering event's time, under the version's half-life. */
        static Row of(InteractionProfile profile, LiveModel model, long atEpochMs) {
            double[] byEntry = new double[profile.size()];
            long[] itemAndEntry = new long[profile.size()];
            var halfLife = model.settings().weights().halfLife();
            double halfLifeMs = halfLife == null ? 0 : halfLife.toMillis();
            int n = 0;
            for (int entry = 0; entry < profile.size(); entry++) {
                int i = model.indexOf(profile, entry);
                double strength = profile.strengthAt(entry, atEpochMs, halfLifeMs);
                if (i >= 0 && strength > 0) {
                    byEntry[entry] = strength;
                    itemAndEntry[n++] = ((long) i << 32) | entry;
                }
            }
            int[] history = new int[n];
            for (int p = 0; p < n; p++) {
                history[p] = (int) (itemAndEntry[p] >>> 32);
            }
            java.util.Arrays.sort(itemAndEntry, 0, n);
            int[] items = new int[n];
            double[] strengths = new double[n];
            for (int p = 0; p < n; p++) {
                items[p] = (int) (itemAndEntry[p] >>> 32);
                strengths[p] = byEntry[(int) itemAndEntry[p]];
            }
            return new Row(items, strengths, history);
        }
    }
}
