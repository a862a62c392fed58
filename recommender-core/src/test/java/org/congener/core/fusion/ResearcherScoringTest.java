package org.congener.core.fusion;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.SplittableRandom;
import java.util.stream.Stream;
import org.congener.core.factorisation.AlsConfig;
import org.congener.core.factorisation.FactorMatrix;
import org.congener.core.factorisation.FixedFactors;
import org.congener.core.factorisation.FoldIn;
import org.congener.schemas.FusionRule;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The workspace path against the scoring as it was ({@link ScoringAsBefore}), against fresh workspaces,
 * and, warm-started as the stream runs it, against the batch top-N.
 */
class ResearcherScoringTest {
    private static final int LIST = 10;

    /** Seeded random model: catalogue size and rank chosen off the multiples of 4 rows and 8 lanes. */
    private record Model(FactorMatrix y, FoldIn foldIn, NeighbourLists neighbours) {
        static Model random(int items, int rank, long seed) {
            return random(items, rank, seed, false);
        }

        /** @param floats round every factor to a float, as published factors are */
        static Model random(int items, int rank, long seed, boolean floats) {
            SplittableRandom random = new SplittableRandom(seed);
            FactorMatrix y = FactorMatrix.random(items, rank, seed);
            if (floats) {
                double[] data = y.data();
                for (int t = 0; t < data.length; t++) {
                    data[t] = (float) data[t];
                }
            }
            // compounds without factors (never interacted with in training): CF score 0 for everyone
            for (int t = 0; t < items / 10; t++) {
                y.setRow(random.nextInt(items), new double[rank]);
            }
            int[][] ids = new int[items][];
            double[][] sims = new double[items][];
            for (int i = 0; i < items; i++) {
                final int self = i;
                int k = random.nextInt(8);
                ids[i] = random.ints(0, items).filter(j -> j != self).distinct().limit(k).toArray();
                // similarities on a coarse grid, so that semantic scores tie
                sims[i] = random.ints(k, 1, 5).mapToDouble(s -> s / 4.0).sorted().toArray();
                reverse(sims[i]);
            }
            AlsConfig config = AlsConfig.defaults().withRank(rank).withLambda(0.1).withAlpha(10.0);
            return new Model(y, new FoldIn(FixedFactors.of(y), config), new NeighbourLists(ids, sims));
        }

        ResearcherScoring scoring(FusionSettings fusion) {
            return new ResearcherScoring(foldIn, y, neighbours, fusion);
        }

        int items() {
            return y.rows();
        }
    }

    private record History(int[] items, double[] strengths) {
        static History random(SplittableRandom random, int items, int size) {
            int[] ids = random.ints(0, items).distinct().limit(size).toArray();
            double[] strengths = random.ints(size, 1, 4).asDoubleStream().toArray();
            return new History(ids, strengths);
        }

        History withOneMore(SplittableRandom random, int items) {
            int next;
            do {
                next = random.nextInt(items);
            } while (contains(next));
            int[] ids = Arrays.copyOf(this.items, this.items.length + 1);
            double[] s = Arrays.copyOf(strengths, strengths.length + 1);
            ids[ids.length - 1] = next;
            s[s.length - 1] = 1 + random.nextInt(3);
            return new History(ids, s);
        }

        private boolean contains(int item) {
            return Arrays.stream(items).anyMatch(i -> i == item);
        }
    }

    private static void reverse(double[] v) {
        for (int a = 0, b = v.length - 1; a < b; a++, b--) {
            double t = v[a];
            v[a] = v[b];
            v[b] = t;
        }
    }

    static Stream<FusionSettings> rules() {
        return Stream.of(FusionSettings.product(), FusionSettings.blend(0.3), FusionSettings.rankFusion(60),
                new FusionSettings(FusionRule.CF_ONLY, 1, 60, 0), new FusionSettings(FusionRule.SEMANTIC_ONLY, 0, 60, 0));
    }

    static Stream<Arguments> rulesAndSizes() {
        return rules().flatMap(f -> Stream.of(Arguments.of(f, 257, 13), Arguments.of(f, 200, 16)));
    }

    /** x_u as the stream keeps it for the next event. */
    private static double[] kept(ScoringWorkspace ws) {
        double[] x = new double[ws.rank()];
        ws.copyVector(x);
        return x;
    }

    private static void assertSameBits(double[] expected, String what, java.util.function.IntToDoubleFunction read,
                                       int n) {
        for (int i = 0; i < n; i++) {
            assertEquals(Double.doubleToLongBits(expected[i]), Double.doubleToLongBits(read.applyAsDouble(i)),
                    what + "[" + i + "]: " + expected[i] + " vs " + read.applyAsDouble(i));
        }
    }

    private static void assertSameScores(OneResearcherScoring.Scores expected, ScoringWorkspace ws, String where) {
        assertSameBits(expected.vector(), where + " x_u", ws::vector, ws.rank());
        assertSameBits(expected.cf(), where + " cf", ws::cf, ws.itemCount());
        assertSameBits(expected.semantic(), where + " semantic", ws::semantic, ws.itemCount());
        assertSameBits(expected.fused(), where + " fused", ws::fused, ws.itemCount());
    }

    @ParameterizedTest
    @MethodSource("rulesAndSizes")
    void shouldEqualTheScoringAsItWasBitForBitWhenDataAreSeededRandom(FusionSettings fusion, int items, int rank) {
        // the same operations in the same order: x_u by the same Cholesky, each CF score the chain of fused
        // multiply-adds over the factors in order, the same spread and divisions, the same normalisation
        // and ranks
        for (boolean floats : new boolean[] {false, true}) {
            Model model = Model.random(items, rank, 21L + rank, floats);
            ResearcherScoring scoring = model.scoring(fusion);
            // factors that are floats are read as floats by the CF product, with the same bits out
            assertEquals(floats, scoring.readsFloatFactors());
            ScoringWorkspace ws = scoring.newWorkspace();
            SplittableRandom random = new SplittableRandom(4);
            for (int size : new int[] {0, 1, 2, 7, 20, 33}) {
                History h = History.random(random, items, size);
                OneResearcherScoring.Scores before = ScoringAsBefore.score(model.foldIn(), model.y(), model.neighbours(),
                        fusion, h.items(), h.strengths());
                String where = fusion.rule() + ", " + size + " items:";
                assertSameScores(before, scoring.score(h.items(), h.strengths(), null, ws), where);
                assertCfWithinRoundingOfAPlainLoop(model.y(), ws, where);
                OneResearcherScoring.Scores batch = OneResearcherScoring.score(model.foldIn(), model.y(), model.neighbours(),
                        fusion, h.items(), h.strengths());
                assertSameScores(batch, ws, where + " batch");
                assertArrayEquals(OneResearcherScoring.topN(before.fused(), LIST, i -> i % 3 != 0),
                        ws.topN(LIST, i -> i % 3 != 0), where + " top-N");
                for (int i : h.items()) {
                    assertEquals(Double.NEGATIVE_INFINITY, ws.fused(i), where + " own item " + i);
                }
                assertEquals(size, ws.researcherItems());
                assertEquals(0, ws.foldInSteps(), "no warm start: exact fold-in");
            }
        }
    }

    /**
     * Each CF score against x·y_i summed by a plain double loop: the chain and the loop are each within
     * γ_k·Σ_t |y_it·x_t| of the exact sum (γ_k = k·u/(1 − k·u), u the unit roundoff), so they differ by
     * at most 2·γ_k·Σ_t |y_it·x_t|, below 2.01·k·u·Σ_t |y_it·x_t| at these ranks.
     */
    private static void assertCfWithinRoundingOfAPlainLoop(FactorMatrix y, ScoringWorkspace ws, String where) {
        int k = ws.rank();
        for (int i = 0; i < ws.itemCount(); i++) {
            double plain = 0;
            double magnitude = 0;
            for (int t = 0; t < k; t++) {
                double p = y.get(i, t) * ws.vector(t);
                plain += p;
                magnitude += Math.abs(p);
            }
            double bound = 2.01 * k * (Math.ulp(1.0) / 2) * magnitude;
            assertTrue(Math.abs(ws.cf(i) - plain) <= bound,
                    where + " cf[" + i + "] " + ws.cf(i) + " vs plain " + plain + ", bound " + bound);
        }
    }

    @Test
    void shouldGiveZeroVectorAndCfScoresWhenTheResearcherHasNoItems() {
        Model model = Model.random(101, 9, 5L);
        ScoringWorkspace ws = model.scoring(FusionSettings.blend(0.5)).score(new int[0], new double[0],
                new double[9], model.scoring(FusionSettings.blend(0.5)).newWorkspace());
        for (int f = 0; f < 9; f++) {
            assertEquals(0.0, ws.vector(f));
        }
        for (int i = 0; i < 101; i++) {
            assertEquals(0.0, ws.cf(i));
            assertEquals(0.0, ws.semantic(i));
            // every candidate ties on both sides: each normalises to 1, so w·1 + (1 − w)·1
            assertEquals(1.0, ws.fused(i));
        }
    }

    @Test
    void shouldGiveTheScoresOfFreshWorkspacesWhenOneIsReusedAcrossResearchersOfDifferentSizes() {
        Model model = Model.random(257, 13, 8L);
        SplittableRandom random = new SplittableRandom(9);
        ScoringWorkspace reused = new ScoringWorkspace(257, 13);
        // sizes past the workspace's first capacity of 16, back to none, and rules alternating on it,
        // rank fusion with two different k
        int[] sizes = {3, 40, 0, 17, 1, 90, 5, 0, 33, 12, 8, 21};
        FusionSettings[] rules = Stream.concat(rules(), Stream.of(FusionSettings.rankFusion(7)))
                .toArray(FusionSettings[]::new);
        for (int t = 0; t < sizes.length; t++) {
            FusionSettings fusion = rules[t % rules.length];
            ResearcherScoring scoring = model.scoring(fusion);
            History h = History.random(random, 257, sizes[t]);
            double[] start = t % 2 == 0 ? null : kept(scoring.score(h.items(), h.strengths(), null,
                    scoring.newWorkspace()));
            ScoringWorkspace fresh = scoring.score(h.items(), h.strengths(), start, scoring.newWorkspace());
            OneResearcherScoring.Scores expected = new OneResearcherScoring.Scores(fresh.vector.clone(),
                    fresh.cf.clone(), fresh.semantic.clone(), fresh.fused.clone());
            assertSame(reused, scoring.score(h.items(), h.strengths(), start, reused));
            assertSameScores(expected, reused, fusion.rule() + ", researcher " + t);
            assertEquals(fresh.foldInSteps(), reused.foldInSteps());
        }
    }

    @ParameterizedTest
    @MethodSource("rules")
    void shouldGiveTheBatchTopNWhenTheStreamWarmStartsEachEventFromTheVectorItKept(FusionSettings fusion) {
        Model model = Model.random(257, 13, 12L);
        ResearcherScoring scoring = model.scoring(fusion);
        ScoringWorkspace ws = scoring.newWorkspace();
        SplittableRandom random = new SplittableRandom(13);
        for (int researcher = 0; researcher < 5; researcher++) {
            History h = History.random(random, 257, 1);
            double[] kept = null;
            int warmSteps = 0;
            for (int event = 0; event < 25; event++) {
                scoring.score(h.items(), h.strengths(), kept, ws);
                OneResearcherScoring.Scores batch = OneResearcherScoring.score(model.foldIn(), model.y(),
                        model.neighbours(), fusion, h.items(), h.strengths());
                String where = fusion.rule() + ", researcher " + researcher + ", event " + event;
                assertArrayEquals(OneResearcherScoring.topN(batch.fused(), LIST, i -> true), ws.topN(LIST, i -> true),
                        where);
                assertVectorClose(batch.vector(), ws, where);
                // a compound without factors adds nothing to the system: the kept vector is then already
                // the solution and CG takes no step
                warmSteps += kept == null ? 0 : ws.foldInSteps();
                kept = kept(ws);
                h = h.withOneMore(random, 257);
            }
            assertTrue(warmSteps >= 24, "CG steps over 24 warm-started events: " + warmSteps);
        }
    }

    private static void assertVectorClose(double[] exact, ScoringWorkspace ws, String where) {
        double diff = 0;
        double norm = 0;
        for (int f = 0; f < exact.length; f++) {
            diff += (exact[f] - ws.vector(f)) * (exact[f] - ws.vector(f));
            norm += exact[f] * exact[f];
        }
        assertTrue(Math.sqrt(diff) <= 1e-9 * Math.sqrt(norm), where + ": relative " + Math.sqrt(diff / norm));
    }

    @Test
    void shouldRefuseAWorkspaceOfAnotherSizeAndItemsOutsideTheCatalogue() {
        Model model = Model.random(50, 8, 3L);
        ResearcherScoring scoring = model.scoring(FusionSettings.product());
        int[] items = {1, 2};
        double[] strengths = {1, 1};
        assertThrows(IllegalArgumentException.class,
                () -> scoring.score(items, strengths, null, new ScoringWorkspace(51, 8)));
        assertThrows(IllegalArgumentException.class,
                () -> scoring.score(items, strengths, null, new ScoringWorkspace(50, 9)));
        assertThrows(IllegalArgumentException.class,
                () -> scoring.score(new int[] {1, 50}, strengths, null, scoring.newWorkspace()));
        assertThrows(IllegalArgumentException.class,
                () -> scoring.score(items, new double[1], null, scoring.newWorkspace()));
    }

    @Test
    void shouldKeepAFittingWorkspaceAndReplaceOneThatDoesNotFitWhenTheVersionChanges() {
        Model model = Model.random(50, 8, 3L);
        ResearcherScoring scoring = model.scoring(FusionSettings.product());
        ScoringWorkspace fits = new ScoringWorkspace(50, 8);
        assertSame(fits, scoring.workspaceFor(fits));
        ScoringWorkspace replaced = scoring.workspaceFor(new ScoringWorkspace(60, 8));
        assertTrue(replaced.fits(50, 8));
        assertTrue(scoring.workspaceFor(null).fits(50, 8));
    }

    @ParameterizedTest
    @MethodSource("rules")
    void shouldEqualOneResearcherAtATimeBitForBitWhenResearchersAreScoredTogetherInABatch(FusionSettings fusion) {
        for (boolean floats : new boolean[] {false, true}) {
            Model model = Model.random(257, 13, 31L, floats);
            ResearcherScoring scoring = model.scoring(fusion);
            SplittableRandom random = new SplittableRandom(12);
            ScoringWorkspace alone = scoring.newWorkspace();
            ScoringWorkspace batched = scoring.newWorkspace();
            ScoringBatch batch = scoring.newBatch(9);
            // every size from one to capacity, reused, so groups of four vectors and every remainder are
            // multiplied; warm starts on every other researcher
            for (int size : new int[] {9, 4, 1, 8, 5, 2, 7, 3, 6}) {
                History[] histories = new History[size];
                double[][] starts = new double[size][];
                batch.clear();
                for (int b = 0; b < size; b++) {
                    histories[b] = History.random(random, 257, random.nextInt(40));
                    starts[b] = b % 2 == 0 || histories[b].items().length == 0 ? null
                            : kept(scoring.score(histories[b].items(), histories[b].strengths(), null,
                                    scoring.newWorkspace()));
                    scoring.foldIn(histories[b].items(), histories[b].strengths(), starts[b], batched);
                    assertEquals(b, batch.add(kept(batched)));
                }
                assertEquals(size == 9, batch.isFull());
                scoring.multiplyBatch(batch, batched);
                for (int b = 0; b < size; b++) {
                    History h = histories[b];
                    scoring.score(h.items(), h.strengths(), starts[b], alone);
                    OneResearcherScoring.Scores expected = new OneResearcherScoring.Scores(alone.vector.clone(),
                            alone.cf.clone(), alone.semantic.clone(), alone.fused.clone());
                    scoring.scoreColumn(batch, b, h.items(), h.strengths(), batched);
                    assertSameScores(expected, batched, fusion.rule() + (floats ? " floats" : " doubles")
                            + ", batch of " + size + ", column " + b + ":");
                }
            }
        }
    }

    @Test
    void shouldRefuseAColumnWhenTheBatchWasNotMultipliedOrTheColumnIsOutside() {
        Model model = Model.random(101, 9, 3L);
        ResearcherScoring scoring = model.scoring(FusionSettings.blend(0.5));
        ScoringWorkspace ws = scoring.newWorkspace();
        ScoringBatch batch = scoring.newBatch(2);
        batch.add(new double[9]);
        assertThrows(IllegalArgumentException.class,
                () -> scoring.scoreColumn(batch, 0, new int[0], new double[0], ws), "not multiplied");
        scoring.multiplyBatch(batch, ws);
        assertThrows(IllegalArgumentException.class,
                () -> scoring.scoreColumn(batch, 1, new int[0], new double[0], ws), "column past the size");
        batch.add(new double[9]);
        assertThrows(IllegalStateException.class, () -> batch.add(new double[9]), "full");
        assertThrows(IllegalArgumentException.class,
                () -> Model.random(101, 8, 3L).scoring(FusionSettings.blend(0.5)).multiplyBatch(batch,
                        Model.random(101, 8, 3L).scoring(FusionSettings.blend(0.5)).newWorkspace()), "other rank");
    }
}
