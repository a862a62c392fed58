package org.congener.core.metrics;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.BitSet;
import java.util.Comparator;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/** The rank-based metrics the evaluation uses must equal the list-based ones checked against sources. */
class HeldOutRanksTest {

    @Test
    void shouldAgreeWithTheListFormsOfEveryMetricOnRandomRankings() {
        SplittableRandom random = new SplittableRandom(9);
        for (int trial = 0; trial < 200; trial++) {
            int items = 5 + random.nextInt(40);
            double[] scores = new double[items];
            for (int i = 0; i < items; i++) {
                scores[i] = random.nextInt(10); // ties on purpose
            }
            BitSet training = new BitSet();
            BitSet relevant = new BitSet();
            List<Integer> held = new ArrayList<>();
            for (int i = 0; i < items; i++) {
                int roll = random.nextInt(6);
                if (roll == 0) {
                    training.set(i);
                } else if (roll == 1) {
                    relevant.set(i);
                    held.add(i);
                }
            }
            if (held.isEmpty()) {
                continue;
            }
            List<Integer> order = new ArrayList<>();
            for (int i = 0; i < items; i++) {
                if (!training.get(i)) {
                    order.add(i);
                }
            }
            order.sort(Comparator.<Integer>comparingDouble(i -> -scores[i]).thenComparingInt(i -> i));
            int[] ranking = order.stream().mapToInt(Integer::intValue).toArray();
            HeldOutRanks ranks = HeldOutRanks.of(scores, training, held.stream().mapToInt(Integer::intValue).toArray());
            for (int k : new int[] {1, 3, 10}) {
                assertEquals(RankingMetrics.precisionAtK(ranking, relevant, k), ranks.precisionAtK(k), 1e-12);
                assertEquals(RankingMetrics.recallAtK(ranking, relevant, k), ranks.recallAtK(k), 1e-12);
                assertEquals(RankingMetrics.f1AtK(ranking, relevant, k), ranks.f1AtK(k), 1e-12);
                assertEquals(RankingMetrics.ndcgAtK(ranking, relevant, k), ranks.ndcgAtK(k), 1e-12);
                assertEquals(RankingMetrics.aucAtN(ranking, relevant, k), ranks.aucAtN(k), 1e-12);
            }
            assertEquals(RankingMetrics.reciprocalRank(ranking, relevant), ranks.reciprocalRank(), 1e-12);
            assertEquals(RankingMetrics.auc(ranking, relevant), ranks.auc(), 1e-12);
        }
    }
}
