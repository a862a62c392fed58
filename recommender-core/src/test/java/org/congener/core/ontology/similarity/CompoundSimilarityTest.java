package org.congener.core.ontology.similarity;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.congener.core.ontology.SmallDag;
import org.congener.core.ontology.ic.SecoIntrinsicIc;
import org.junit.jupiter.api.Test;

/**
 * Compound X maps to {E, G}, compound Y to {F, B}. Lin with Seco IC gives the matrix
 * (rows E, G; columns F, B) [[0.4717, 0], [0.1383, 0.6410]] (values as in {@link SimilarityMeasureTest}).
 */
class CompoundSimilarityTest {
    private final SmallDag dag = SmallDag.load();
    private final SimilarityMeasure lin = new LinSimilarity(dag.ontology, SecoIntrinsicIc.compute(dag.ontology));
    private final int[] x = {dag.term("E"), dag.term("G")};
    private final int[] y = {dag.term("F"), dag.term("B")};

    @Test
    void shouldTakeTheBestPairWhenAggregatingByMaximum() {
        assertEquals(0.6410081452354491, new CompoundSimilarity(lin, Aggregation.MAX).similarity(x, y), 1e-12);
    }

    @Test
    void shouldAverageBestMatchesBothWaysWhenAggregatingByBestMatchAverage() {
        // rows: (0.4717 + 0.6410) / 2; columns: (0.4717 + 0.6410) / 2; BMA = their mean = 0.5563436558308652
        CompoundSimilarity bma = new CompoundSimilarity(lin, Aggregation.BEST_MATCH_AVERAGE);
        assertEquals(0.5563436558308652, bma.similarity(x, y), 1e-12);
        assertEquals(bma.similarity(x, y), bma.similarity(y, x), 0.0);
    }

    @Test
    void shouldGiveZeroWhenACompoundHasNoTerms() {
        assertEquals(0.0, new CompoundSimilarity(lin, Aggregation.MAX).similarity(x, new int[0]), 0.0);
    }
}
