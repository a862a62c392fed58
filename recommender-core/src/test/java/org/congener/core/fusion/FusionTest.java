package org.congener.core.fusion;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.congener.core.interactions.InteractionMatrix;
import org.congener.core.metrics.ScoreFunction;
import org.congener.schemas.FusionRule;
import org.junit.jupiter.api.Test;

class FusionTest {
    private static final TinyTaxonomySimilarity SIM = new TinyTaxonomySimilarity();
    private static final NeighbourLists LISTS = NeighbourLists.fromSimilarity(SIM, TinyTaxonomySimilarity.ITEMS, 4);
    // user 0 touched items 0 (strength 3) and 3 (strength 1)
    private static final InteractionMatrix TRAIN = InteractionMatrix.of(2, 5,
            new int[] {0, 0, 1}, new int[] {0, 3, 4}, new double[] {3, 1, 1});

    @Test
    void shouldGiveWuPalmerValuesOfTheHandMadeTaxonomy() {
        // depths: leaves 0,1 at 4, leaf 2 at 3, leaves 3,4 at 3; lca(0,1) = carboxylic (3): 6/8
        assertEquals(0.75, SIM.similarity(0, 1), 1e-12);
        // lca(0,2) = acids (2): 4/7
        assertEquals(4.0 / 7, SIM.similarity(0, 2), 1e-12);
        // lca(3,4) = bases (2): 4/6; lca(0,3) = root: 2/7
        assertEquals(4.0 / 6, SIM.similarity(3, 4), 1e-12);
        assertEquals(2.0 / 7, SIM.similarity(0, 3), 1e-12);
        assertArrayEquals(new int[] {1, 2, 3, 4}, LISTS.neighbours(0));
    }

    @Test
    void shouldAverageWeighAndTakeTheBestMatchOverTheResearchersItems() {
        double[] out = new double[5];
        new SemanticScorer(TRAIN.byUser(), LISTS, SemanticAggregation.MEAN).scoreAll(0, out);
        // item 1: (sim(1,0) + sim(1,3)) / 2 = (0.75 + 2/7) / 2
        assertEquals((0.75 + 2.0 / 7) / 2, out[1], 1e-12);
        // item 4: (sim(4,0) + sim(4,3)) / 2 = (2/7 + 4/6) / 2
        assertEquals((2.0 / 7 + 4.0 / 6) / 2, out[4], 1e-12);
        new SemanticScorer(TRAIN.byUser(), LISTS, SemanticAggregation.WEIGHTED).scoreAll(0, out);
        assertEquals((3 * 0.75 + 2.0 / 7) / 4, out[1], 1e-12);
        new SemanticScorer(TRAIN.byUser(), LISTS, SemanticAggregation.BEST_MATCH).scoreAll(0, out);
        assertEquals(0.75, out[1], 1e-12);
        assertEquals(4.0 / 6, out[4], 1e-12);
    }

    @Test
    void shouldLetSemanticsReorderItemsOnWhichCfNearlyTies() {
        // CF prefers item 4 a little over item 1; the researcher's acid history favours item 1
        ScoreFunction cf = (u, out) -> {
            double[] s = {9, 0.50, -1.0, 9, 0.52};
            System.arraycopy(s, 0, out, 0, s.length);
        };
        ScoreFunction sem = new SemanticScorer(TRAIN.byUser(), LISTS, SemanticAggregation.WEIGHTED);
        double[] out = new double[5];
        new FusedScorer(cf, sem, TRAIN.byUser(), FusionSettings.product()).scoreAll(0, out);
        assertTrue(out[1] > out[4], "product");
        new FusedScorer(cf, sem, TRAIN.byUser(), new FusionSettings(FusionRule.CF_ONLY, 1, 60, 0)).scoreAll(0, out);
        assertTrue(out[4] > out[1], "CF alone");
        assertEquals(Double.NEGATIVE_INFINITY, out[0]);
        new FusedScorer(cf, sem, TRAIN.byUser(), FusionSettings.blend(0.5)).scoreAll(0, out);
        assertTrue(out[1] > out[4], "blend");
        new FusedScorer(cf, sem, TRAIN.byUser(), FusionSettings.rankFusion(60)).scoreAll(0, out);
        // candidates 1, 2, 4: cf ranks 4→1, 1→2, 2→3; weighted sem ranks 1→1, 2→2, 4→3 (by hand)
        assertEquals(1.0 / 62 + 1.0 / 61, out[1], 1e-12);
        assertEquals(1.0 / 61 + 1.0 / 63, out[4], 1e-12);
    }

    @Test
    void shouldRankByDistinctResearchersForThePopularityBaseline() {
        InteractionMatrix m = InteractionMatrix.of(3, 3, new int[] {0, 1, 2, 0}, new int[] {2, 2, 2, 1},
                new double[] {1, 5, 1, 9});
        double[] out = new double[3];
        new PopularityScorer(m.byItem()).scoreAll(0, out);
        assertArrayEquals(new double[] {0, 1, 3}, out, 0.0);
    }
}
