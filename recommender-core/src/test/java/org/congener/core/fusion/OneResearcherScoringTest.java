package org.congener.core.fusion;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Arrays;
import java.util.Comparator;
import java.util.stream.IntStream;
import org.congener.core.factorisation.AlsConfig;
import org.congener.core.factorisation.FactorMatrix;
import org.congener.core.factorisation.FixedFactors;
import org.congener.core.factorisation.FoldIn;
import org.congener.core.interactions.SparseRows;
import org.junit.jupiter.api.Test;

class OneResearcherScoringTest {

    private static final int ITEMS = 12;
    private static final int RANK = 4;

    private static NeighbourLists chain() {
        int[][] ids = new int[ITEMS][];
        double[][] sims = new double[ITEMS][];
        for (int i = 0; i < ITEMS; i++) {
            ids[i] = new int[] {(i + 1) % ITEMS, (i + 2) % ITEMS};
            sims[i] = new double[] {0.8, 0.4};
        }
        return new NeighbourLists(ids, sims);
    }

    @Test
    void shouldEqualTheBatchFusedScorerWhenGivenTheSameRowAndFoldedVector() {
        FactorMatrix y = FactorMatrix.random(ITEMS, RANK, 7L);
        FoldIn foldIn = new FoldIn(FixedFactors.of(y), AlsConfig.defaults().withRank(RANK));
        int[] items = {5, 1, 9};
        double[] strengths = {2.0, 1.0, 0.5};
        for (FusionSettings fusion : new FusionSettings[] {FusionSettings.product(), FusionSettings.blend(0.3),
                FusionSettings.rankFusion(60)}) {
            OneResearcherScoring.Scores s = OneResearcherScoring.score(foldIn, y, chain(), fusion, items, strengths);

            SparseRows batch = new SparseRows(1, ITEMS, new int[] {0, 3}, new int[] {1, 5, 9}, new double[] {1.0, 2.0, 0.5});
            double[] x = foldIn.foldInUser(batch.rowColumns(0), batch.rowValues(0));
            double[] expected = new double[ITEMS];
            new FusedScorer((u, out) -> {
                for (int i = 0; i < ITEMS; i++) {
                    double d = 0;
                    for (int f = 0; f < RANK; f++) {
                        d += x[f] * y.get(i, f);
                    }
                    out[i] = d;
                }
            }, new SemanticScorer(batch, chain(), SemanticAggregation.MEAN), batch, fusion).scoreAll(0, expected);
            assertArrayEquals(expected, s.fused(), 1e-12, fusion.rule().name());
            assertEquals(Double.NEGATIVE_INFINITY, s.fused()[5]);
        }
    }

    @Test
    void shouldReturnTheBestEligibleItemsInOrderWhenSomeAreFilteredOut() {
        double[] fused = {0.5, Double.NEGATIVE_INFINITY, 0.9, 0.1, 0.9, 0.7, 0.3};
        int[] top = OneResearcherScoring.topN(fused, 3, i -> i != 5);
        Integer[] byHand = IntStream.range(0, fused.length).boxed()
                .filter(i -> i != 5 && fused[i] != Double.NEGATIVE_INFINITY)
                .sorted(Comparator.<Integer>comparingDouble(i -> -fused[i]).thenComparing(i -> i))
                .limit(3).toArray(Integer[]::new);
        assertEquals(Arrays.toString(byHand), Arrays.toString(IntStream.of(top).boxed().toArray()));
        assertArrayEquals(new int[] {2, 4, 0}, top);
    }
}
