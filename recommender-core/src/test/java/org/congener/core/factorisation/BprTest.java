package org.congener.core.factorisation;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Map;
import org.congener.core.interactions.InteractionMatrix;
import org.congener.core.interactions.PlantedInteractions;
import org.congener.core.metrics.RankingEvaluation;
import org.congener.core.split.LeaveKOut;
import org.congener.core.split.Split;
import org.congener.core.interactions.Interaction;
import org.congener.core.interactions.InteractionMatrixBuilder;
import org.junit.jupiter.api.Test;

class BprTest {
    private static final InteractionMatrix DATA = PlantedInteractions.generate(400, 150, 8000, 4, 2.5, 3L);

    private static java.util.List<Interaction> cells(InteractionMatrix m) {
        java.util.List<Interaction> out = new java.util.ArrayList<>();
        for (int u = 0; u < m.userCount(); u++) {
            for (int p = m.byUser().rowStart(u); p < m.byUser().rowEnd(u); p++) {
                out.add(new Interaction(u, m.byUser().column(p), m.byUser().value(p), 0L));
            }
        }
        return out;
    }

    private static InteractionMatrix matrix(java.util.List<Interaction> cells, int users, int items) {
        InteractionMatrixBuilder b = new InteractionMatrixBuilder(users, items);
        cells.forEach(i -> b.add(i.user(), i.item(), i.strength()));
        return b.build();
    }

    @Test
    void shouldRankHeldOutItemsWellAboveChanceOnPlantedData() {
        Split split = new LeaveKOut(1, 1L).split(cells(DATA));
        InteractionMatrix train = matrix(split.train(), DATA.userCount(), DATA.itemCount());
        BprModel model = new Bpr(BprConfig.defaults().withRank(8).withEpochs(40).withThreads(2)).fit(train);
        RankingEvaluation evaluation = new RankingEvaluation(new int[] {10}, 50, 1);
        Map<String, double[]> values = evaluation.perResearcher(train.byUser(), split.test(), model::scoreAll);
        double auc = java.util.Arrays.stream(values.get("auc")).average().orElseThrow();
        // chance is 0.5; the planted structure is strong (sharpness 2.5), so a working BPR is far above
        assertTrue(auc > 0.75, "AUC " + auc);
    }

    @Test
    void shouldGiveTheSameModelForTheSameSeedAndThreadCount() {
        BprConfig cfg = BprConfig.defaults().withRank(4).withEpochs(3).withThreads(2);
        BprModel a = new Bpr(cfg).fit(DATA);
        BprModel b = new Bpr(cfg).fit(DATA);
        assertArrayEquals(a.itemFactors().data(), b.itemFactors().data(), 0.0);
        assertArrayEquals(a.userFactors().data(), b.userFactors().data(), 0.0);
        BprModel c = new Bpr(cfg.withSeed(99L)).fit(DATA);
        assertNotEquals(a.itemFactors().data()[0], c.itemFactors().data()[0]);
    }

    @Test
    void shouldScoreTheFoldedInUsersOwnItemsAboveOthers() {
        BprModel model = new Bpr(BprConfig.defaults().withRank(8).withEpochs(30).withThreads(1)).fit(DATA);
        int user = 5;
        int[] items = DATA.byUser().rowColumns(user);
        double[] xu = Bpr.foldInUser(model, items, 3000, 17L);
        double ownMean = 0;
        double otherMean = 0;
        int others = 0;
        for (int i = 0; i < DATA.itemCount(); i++) {
            double s = model.itemBias()[i];
            for (int f = 0; f < xu.length; f++) {
                s += xu[f] * model.itemFactors().get(i, f);
            }
            if (DATA.byUser().contains(user, i)) {
                ownMean += s / items.length;
            } else {
                otherMean += s;
                others++;
            }
        }
        assertTrue(ownMean > otherMean / others + 0.5, ownMean + " vs " + otherMean / others);
    }
}
