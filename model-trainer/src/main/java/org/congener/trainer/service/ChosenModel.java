package org.congener.trainer.service;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.congener.core.factorisation.AlsConfig;
import org.congener.core.fusion.FusionSettings;
import org.congener.core.fusion.SemanticAggregation;
import org.congener.schemas.FusionRule;
import org.congener.trainer.evaluation.ExperimentReport;
import org.congener.trainer.evaluation.ModelResult;
import org.congener.trainer.evaluation.OfflineExperiment;

/**
 * The model the trainer would publish: the best, on the gate metric, of the models the streams app can
 * serve (ALS factors with one of the fusion rules), with its configuration and held-out figures.
 */
public record ChosenModel(String name, AlsConfig als, FusionSettings fusion, SemanticAggregation aggregation,
                          double figure, Map<String, Double> metrics) {

    /** Report model name → the fusion rule the streams app applies to serve it. */
    static final Map<String, FusionRule> SERVABLE = Map.of(
            OfflineExperiment.ALS, FusionRule.CF_ONLY,
            OfflineExperiment.ALS_SEMANTIC, FusionRule.PRODUCT,
            OfflineExperiment.BLEND, FusionRule.BLEND,
            OfflineExperiment.RANK_FUSION, FusionRule.RANK_FUSION);

    public static ChosenModel pick(ExperimentReport report, String metric, AlsConfig base) {
        ChosenModel best = null;
        for (ModelResult m : report.models()) {
            FusionRule rule = SERVABLE.get(m.name());
            if (rule == null || m.metrics().get(metric) == null) {
                continue;
            }
            double figure = m.metrics().get(metric).mean();
            if (best == null || figure > best.figure()) {
                best = of(m, rule, figure, base);
            }
        }
        if (best == null) {
            throw new TrainerException("no servable model was evaluated on " + metric + " (known: "
                    + report.models().stream().map(ModelResult::name).toList() + ")");
        }
        return best;
    }

    @SuppressWarnings("unchecked")
    private static ChosenModel of(ModelResult m, FusionRule rule, double figure, AlsConfig base) {
        Map<String, Object> c = m.configuration();
        Map<String, Object> cf = rule == FusionRule.CF_ONLY ? c : (Map<String, Object>) c.get("cf");
        AlsConfig als = base.withRank(((Number) cf.get("rank")).intValue())
                .withLambda(((Number) cf.get("lambda")).doubleValue())
                .withAlpha(((Number) cf.get("alpha")).doubleValue());
        FusionSettings d = FusionSettings.product();
        FusionSettings fusion = switch (rule) {
            case BLEND -> FusionSettings.blend(((Number) c.get("weight")).doubleValue());
            case RANK_FUSION -> FusionSettings.rankFusion(((Number) c.get("k")).doubleValue());
            case PRODUCT -> new FusionSettings(FusionRule.PRODUCT, d.weight(), d.rrfK(),
                    ((Number) c.getOrDefault("epsilon", d.epsilon())).doubleValue());
            default -> new FusionSettings(rule, d.weight(), d.rrfK(), d.epsilon());
        };
        SemanticAggregation aggregation = SemanticAggregation.MEAN;
        Object semantic = c.get("semantic");
        if (semantic instanceof Map<?, ?> s && s.get("aggregation") != null) {
            aggregation = SemanticAggregation.valueOf(String.valueOf(s.get("aggregation")));
        }
        Map<String, Double> metrics = new LinkedHashMap<>();
        m.metrics().forEach((name, ci) -> {
            if (Double.isFinite(ci.mean())) {
                metrics.put(name, ci.mean());
            }
        });
        return new ChosenModel(m.name(), als, fusion, aggregation, figure, metrics);
    }

    List<String> describe() {
        return List.of(name, "rank " + als.rank(), "λ " + als.lambda(), "α " + als.alpha(), fusion.rule().name());
    }
}
