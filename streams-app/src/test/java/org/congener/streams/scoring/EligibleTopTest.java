package org.congener.streams.scoring;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;

import java.util.SplittableRandom;

import org.congener.core.factorisation.AlsConfig;
import org.congener.core.factorisation.FactorMatrix;
import org.congener.core.factorisation.FixedFactors;
import org.congener.core.factorisation.FoldIn;
import org.congener.core.fusion.FusionSettings;
import org.congener.core.fusion.NeighbourLists;
import org.congener.core.fusion.ResearcherScoring;
import org.congener.core.fusion.ScoringWorkspace;
import org.junit.jupiter.api.Test;

class EligibleTopTest {

    @Test
    void shouldGiveTheFullScanListWhenFewOrManyCandidatesAreEligible() {
        int items = 500;
        int rank = 8;
        FactorMatrix y = FactorMatrix.random(items, rank, 3L);
        // whole-number factors tie many CF scores, so the tie rule is exercised too
        for (int t = 0; t < y.data().length; t++) {
            y.data()[t] = Math.round(y.data()[t] * 4);
        }
        int[][] none = new int[items][0];
        double[][] noSims = new double[items][0];
        ResearcherScoring scoring = new ResearcherScoring(
                new FoldIn(FixedFactors.of(y), AlsConfig.defaults().withRank(rank)), y,
                new NeighbourLists(none, noSims), FusionSettings.blend(0.5));
        ScoringWorkspace ws = scoring.newWorkspace();
        SplittableRandom random = new SplittableRandom(9);
        for (double share : new double[] {1.0, 0.5, 0.05, 0.01, 0.0}) {
            for (int researcher = 0; researcher < 20; researcher++) {
                int[] history = random.ints(0, items).distinct().limit(1 + random.nextInt(30)).toArray();
                double[] strengths = random.doubles(history.length, 0.5, 3).toArray();
                scoring.score(history, strengths, null, ws);
                boolean[] allowed = new boolean[items];
                for (int i = 0; i < items; i++) {
                    allowed[i] = random.nextDouble() < share;
                }
                for (int n : new int[] {1, 10, 40}) {
                    assertArrayEquals(ws.topN(n, i -> allowed[i]), HybridScorer.eligibleTop(ws, n, i -> allowed[i]),
                            "share " + share + ", n " + n);
                }
            }
        }
    }
}
