package org.congener.core.metrics;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.BitSet;
import org.junit.jupiter.api.Test;

/** Each metric against a published worked example; the source is named beside each check. */
class RankingMetricsTest {

    private static BitSet of(int... items) {
        BitSet set = new BitSet();
        for (int i : items) {
            set.set(i);
        }
        return set;
    }

    @Test
    void shouldGivePrecisionOfTheWorkedRetrievalExample() {
        // Manning Publications, "LLM Evaluation and Alignment, The Foundational Ideas", section 6.2.3:
        // five results, relevant ones at ranks 3 and 4: precision@3 = 1/3, precision@5 = 2/5 = 0.40.
        int[] ranking = {10, 11, 12, 13, 14};
        BitSet relevant = of(12, 13);
        assertEquals(1.0 / 3, RankingMetrics.precisionAtK(ranking, relevant, 3), 1e-12);
        assertEquals(0.40, RankingMetrics.precisionAtK(ranking, relevant, 5), 1e-12);
        // recall follows from the same example with both relevant results known: 1/2 at 3, 2/2 at 5
        assertEquals(0.5, RankingMetrics.recallAtK(ranking, relevant, 3), 1e-12);
        assertEquals(1.0, RankingMetrics.recallAtK(ranking, relevant, 5), 1e-12);
    }

    @Test
    void shouldGiveF1OfTheWorkedFMeasureExample() {
        // J. Brownlee, "A Gentle Introduction to the Fbeta-Measure for Machine Learning" (Machine Learning
        // Mastery, 2020), "50% precision, perfect recall": 10 predicted positive, 5 of them true, all 5
        // true found: p = 0.500, r = 1.000, F1 = 0.667. As a top-10 list with 5 relevant items in it:
        int[] ranking = {0, 1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11};
        BitSet relevant = of(5, 6, 7, 8, 9);
        assertEquals(0.5, RankingMetrics.precisionAtK(ranking, relevant, 10), 1e-12);
        assertEquals(1.0, RankingMetrics.recallAtK(ranking, relevant, 10), 1e-12);
        assertEquals(0.667, RankingMetrics.f1AtK(ranking, relevant, 10), 5e-4);
    }

    @Test
    void shouldGiveElevenEighteenthsAsTheMrrOfTheTextbookExample() {
        // Mean reciprocal rank, standard textbook example (as on Wikipedia's "Mean reciprocal rank"):
        // first relevant answers at ranks 3, 2 and 1 give (1/3 + 1/2 + 1)/3 = 11/18 ≈ 0.611.
        double rr1 = RankingMetrics.reciprocalRank(new int[] {7, 8, 9}, of(9));
        double rr2 = RankingMetrics.reciprocalRank(new int[] {7, 8, 9}, of(8));
        double rr3 = RankingMetrics.reciprocalRank(new int[] {7, 8, 9}, of(7));
        assertEquals(11.0 / 18, (rr1 + rr2 + rr3) / 3, 1e-12);
        assertEquals(0.0, RankingMetrics.reciprocalRank(new int[] {1, 2}, of(5)));
    }

    @Test
    void shouldReproduceTheNdcgValuesOfScikitLearnsDocstring() {
        // scikit-learn, sklearn/metrics/_ranking.py, ndcg_score docstring: true relevance
        // [10, 0, 0, 1, 5]; scores [.1, .2, .3, 4, 70] → 0.6957 (printed as 0.69);
        // [.05, 1.1, 1., .5, 0.] → 0.4937 (0.49) and 0.3520 (0.35) at k = 4.
        double[] gains = {10, 0, 0, 1, 5};
        assertEquals(0.6957, RankingMetrics.gradedNdcgAtK(gains, new double[] {.1, .2, .3, 4, 70}, 5), 1e-4);
        assertEquals(0.4937, RankingMetrics.gradedNdcgAtK(gains, new double[] {.05, 1.1, 1., .5, 0.}, 5), 1e-4);
        assertEquals(0.3520, RankingMetrics.gradedNdcgAtK(gains, new double[] {.05, 1.1, 1., .5, 0.}, 4), 1e-4);
    }

    @Test
    void shouldGiveTheBinaryNdcgAsTheGradedOneWithUnitGains() {
        // binary gains are the graded case with gain 1; cross-check on a small list
        int[] ranking = {4, 3, 2, 1, 0};
        BitSet relevant = of(3, 0);
        double[] gains = {1, 0, 0, 1, 0};
        double[] scores = {1, 2, 3, 4, 5};
        assertEquals(RankingMetrics.gradedNdcgAtK(gains, scores, 5), RankingMetrics.ndcgAtK(ranking, relevant, 5), 1e-12);
        // by hand: (1/log2 3 + 1/log2 6) / (1 + 1/log2 3)
        double expected = (1 / log2(3) + 1 / log2(6)) / (1 + 1 / log2(3));
        assertEquals(expected, RankingMetrics.ndcgAtK(ranking, relevant, 5), 1e-12);
    }

    @Test
    void shouldReproduceTheCumulatedDcgOfJarvelinAndKekalainen() {
        // Järvelin & Kekäläinen 2002, ACM TOIS 20(4), section 2.2: G' = <3,2,3,0,0,1,2,2,3,0>, b = 2
        // gives DCG' = <3, 5, 6.89, 6.89, 6.89, 7.28, 7.99, 8.66, 9.61, 9.61> (inputs from memory;
        // arithmetic rechecked, see ../shared/data/README.md).
        double[] dcg = RankingMetrics.jarvelinKekalainenDcg(new double[] {3, 2, 3, 0, 0, 1, 2, 2, 3, 0}, 2);
        assertArrayEquals(new double[] {3, 5, 6.89, 6.89, 6.89, 7.28, 7.99, 8.66, 9.61, 9.61}, dcg, 0.005);
    }

    @Test
    void shouldGiveThreeQuartersForScikitLearnsRocAucExample() {
        // scikit-learn roc_auc_score / auc docstrings: labels [0, 0, 1, 1], scores [.1, .4, .35, .8] → 0.75
        double[] scores = {.1, .4, .35, .8};
        boolean[] labels = {false, false, true, true};
        assertEquals(0.75, RankingMetrics.aucOfScores(scores, labels), 1e-12);
        // the same as a ranking: .8 (pos, item 3), .4 (neg, 1), .35 (pos, 2), .1 (neg, 0)
        assertEquals(0.75, RankingMetrics.auc(new int[] {3, 1, 2, 0}, of(2, 3)), 1e-12);
    }

    @Test
    void shouldReproduceHanleyAndMcNeilsTableOne() {
        // Hanley & McNeil 1982, Radiology 143:29–36, Table 1: 58 normal and 51 abnormal cases rated in
        // five categories; AUC 0.893, standard error 0.032. Counts per category from memory
        // (normal 33/6/6/11/2, abnormal 3/2/2/11/33); they reproduce both published figures.
        int[] normal = {33, 6, 6, 11, 2};
        int[] abnormal = {3, 2, 2, 11, 33};
        int n = 58 + 51;
        double[] scores = new double[n];
        boolean[] positive = new boolean[n];
        int t = 0;
        for (int category = 0; category < 5; category++) {
            for (int c = 0; c < normal[category]; c++) {
                scores[t++] = category + 1;
            }
            for (int c = 0; c < abnormal[category]; c++) {
                positive[t] = true;
                scores[t++] = category + 1;
            }
        }
        double auc = RankingMetrics.aucOfScores(scores, positive);
        assertEquals(0.893, auc, 5e-4);
        assertEquals(0.032, RankingMetrics.hanleyMcNeilStandardError(auc, 51, 58), 5e-4);
    }

    @Test
    void shouldLimitAucToTheFirstNNegativesAndEqualAucWhenNCoversThemAll() {
        // ranking: pos, neg, pos, neg, neg, pos
        int[] ranking = {0, 1, 2, 3, 4, 5};
        BitSet relevant = of(0, 2, 5);
        // full AUC: pairs correctly ordered: neg1 below 1 pos, neg3 below 2, neg4 below 2 → 5 of 9
        assertEquals(5.0 / 9, RankingMetrics.auc(ranking, relevant), 1e-12);
        assertEquals(5.0 / 9, RankingMetrics.aucAtN(ranking, relevant, 3), 1e-12);
        // first negative only: 1 of 3 positives above it
        assertEquals(1.0 / 3, RankingMetrics.aucAtN(ranking, relevant, 1), 1e-12);
        // first two negatives: (1 + 2) / (3 · 2)
        assertEquals(0.5, RankingMetrics.aucAtN(ranking, relevant, 2), 1e-12);
    }

    @Test
    void shouldCoverTheMeanWithABootstrapIntervalThatNarrowsWithMoreResearchers() {
        double[] few = new double[20];
        double[] many = new double[2000];
        java.util.SplittableRandom random = new java.util.SplittableRandom(3);
        for (int t = 0; t < many.length; t++) {
            double v = random.nextDouble();
            many[t] = v;
            if (t < few.length) {
                few[t] = v;
            }
        }
        ConfidenceInterval small = Bootstrap.meanInterval(few, 2000, 0.95, 1L);
        ConfidenceInterval large = Bootstrap.meanInterval(many, 2000, 0.95, 1L);
        assertTrue(small.lower() < small.mean() && small.mean() < small.upper());
        assertTrue(large.upper() - large.lower() < (small.upper() - small.lower()) / 5);
        // uniform(0,1): standard error of the mean over 2000 is 0.2887/√2000 = 0.00645; the 95% width
        // is about 2·1.96·0.00645 = 0.0253 (normal approximation, common practice)
        assertEquals(0.0253, large.upper() - large.lower(), 0.004);
    }

    private static double log2(double v) {
        return Math.log(v) / Math.log(2);
    }
}
