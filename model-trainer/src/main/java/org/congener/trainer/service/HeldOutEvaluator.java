package org.congener.trainer.service;

import java.util.Arrays;
import org.congener.core.factorisation.AlsConfig;
import org.congener.core.factorisation.AlsModel;
import org.congener.core.factorisation.ImplicitAls;
import org.congener.core.fusion.FusedScorer;
import org.congener.core.fusion.FusionSettings;
import org.congener.core.fusion.NeighbourLists;
import org.congener.core.fusion.SemanticAggregation;
import org.congener.core.fusion.SemanticScorer;
import org.congener.core.interactions.InteractionLog;
import org.congener.core.interactions.InteractionMatrix;
import org.congener.core.metrics.RankingEvaluation;
import org.congener.core.metrics.ScoreFunction;
import org.congener.core.split.Split;
import org.congener.schemas.FusionRule;
import org.congener.trainer.evaluation.ExperimentSettings;

/**
 * Scores one configuration (ALS settings plus fusion rule) on the held-out part of the same split the
 * offline experiment used: refitted on that split's training part, mean of the metric over the
 * researchers with a finite value, exactly as the experiment computes its figures. This is how the
 * live version is measured against a candidate: its configuration retrained on today's split, since
 * its published factors have seen today's held-out interactions.
 */
public final class HeldOutEvaluator {
    private final ExperimentSettings settings;

    public HeldOutEvaluator(ExperimentSettings settings) {
        this.settings = settings;
    }

    public double evaluate(InteractionLog log, AlsConfig als, FusionSettings fusion, NeighbourLists neighbours,
                           SemanticAggregation aggregation, String metric) {
        Split split = settings.splitter().split(log.interactions());
        InteractionMatrix train = log.toMatrix(split.train());
        AlsModel model = new ImplicitAls(als).fit(train);
        ScoreFunction scorer = model::scoreAll;
        if (fusion.rule() != FusionRule.CF_ONLY && neighbours != null) {
            scorer = new FusedScorer(model::scoreAll, new SemanticScorer(train.byUser(), neighbours, aggregation),
                    train.byUser(), fusion);
        }
        RankingEvaluation evaluation = new RankingEvaluation(settings.ks(), settings.aucLimit(), settings.threads());
        double[] values = evaluation.perResearcher(train.byUser(), split.test(), scorer).get(metric);
        if (values == null) {
            throw new TrainerException("unknown gate metric " + metric);
        }
        return Arrays.stream(values).filter(Double::isFinite).average().orElse(0.0);
    }
}
