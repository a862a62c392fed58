package org.congener.core.fusion;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;

import org.congener.core.factorisation.FactorMatrix;
import org.junit.jupiter.api.Test;

class NeighbourFactorEstimateTest {

    @Test
    void shouldGiveANewItemTheSimilarityWeightedMeanOfItsTrainedNeighbours() {
        // hand-made taxonomy of TinyTaxonomySimilarity; item 1 is new (no interactions)
        NeighbourLists lists = NeighbourLists.fromSimilarity(new TinyTaxonomySimilarity(), TinyTaxonomySimilarity.ITEMS, 4);
        FactorMatrix y = new FactorMatrix(5, 2, new double[] {1, 0, 9, 9, 0, 1, 2, 2, 4, 0});
        int[] counts = {3, 0, 1, 2, 1};
        FactorMatrix filled = NeighbourFactorEstimate.fillColdItems(y, counts, lists);
        // neighbours of 1: 0 (0.75), 2 (4/7), 3 (2/7), 4 (2/7)
        double w0 = 0.75;
        double w2 = 4.0 / 7;
        double w3 = 2.0 / 7;
        double w4 = 2.0 / 7;
        double total = w0 + w2 + w3 + w4;
        double[] expected = {(w0 * 1 + w2 * 0 + w3 * 2 + w4 * 4) / total, (w0 * 0 + w2 * 1 + w3 * 2 + w4 * 0) / total};
        assertArrayEquals(expected, filled.row(1), 1e-12);
        // trained rows unchanged
        assertArrayEquals(new double[] {1, 0}, filled.row(0), 0.0);
        assertArrayEquals(new double[] {9, 9}, y.row(1), 0.0);
    }
}
