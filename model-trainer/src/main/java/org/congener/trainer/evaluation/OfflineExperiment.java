package org.congener.trainer.evaluation;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.congener.core.factorisation.AlsConfig;
import org.congener.core.factorisation.AlsModel;
import org.congener.core.factorisation.Bpr;
import org.congener.core.factorisation.BprConfig;
import org.congener.core.factorisation.BprModel;
import org.congener.core.factorisation.ImplicitAls;
import org.congener.core.factorisation.TrainingListener;
import org.congener.core.fusion.FusedScorer;
import org.congener.core.fusion.FusionSettings;
import org.congener.core.fusion.NeighbourLists;
import org.congener.core.fusion.PopularityScorer;
import org.congener.core.fusion.SemanticAggregation;
import org.congener.core.fusion.SemanticScorer;
import org.congener.core.interactions.Interaction;
import org.congener.core.interactions.InteractionLog;
import org.congener.core.interactions.InteractionMatrix;
import org.congener.core.metrics.Bootstrap;
import org.congener.core.metrics.ConfidenceInterval;
import org.congener.core.metrics.RankingEvaluation;
import org.congener.core.metrics.ScoreFunction;
import org.congener.core.split.Split;
import org.congener.schemas.FusionRule;

/**
 * The offline experiment behind {@code congener evaluate}: one held-out split; a validation split of
 * the training part for a small grid (ALS rank, λ, α; BPR rank; the semantic aggregation; the blend
 * weight and the rank-fusion k); then every model refitted on the whole training part with its chosen
 * configuration and evaluated on the held-out part with bootstrap intervals over researchers.
 */
public final class OfflineExperiment {
    public static final String ALS = "ALS";
    public static final String BPR = "BPR";
    public static final String SEMANTIC = "semantic-only";
    public static final String POPULARITY = "popularity";
    public static final String ALS_SEMANTIC = "ALS×semantic";
    public static final String BPR_SEMANTIC = "BPR×semantic";
    public static final String BLEND = "blend";
    public static final String RANK_FUSION = "rank-fusion";

    private final ExperimentSettings settings;
    private final Progress progress;

    public OfflineExperiment(ExperimentSettings settings, Progress progress) {
        this.settings = settings;
        this.progress = progress;
    }

    /** Steps the progress bar will count for these settings. */
    public static int steps(ExperimentSettings s, boolean semantic) {
        int alsGrid = s.ranks().size() * s.lambdas().size() * s.alphas().size();
        int fusionGrid = semantic ? 3 + s.blendWeights().size() + s.rrfKs().size() : 0;
        int finals = semantic ? 8 : 3;
        return alsGrid + s.ranks().size() + fusionGrid + finals + 3;
    }

    /** Runs the experiment; {@code neighbours} may be null, then the semantic models are left out. */
    public ExperimentReport run(InteractionLog log, NeighbourLists neighbours, Map<String, Object> extraData) {
        int users = log.users().size();
        int items = log.items().size();
        Split split = settings.splitter().split(log.interactions());
        Split validation = settings.splitter().split(split.train());
        InteractionMatrix inner = log.toMatrix(validation.train());
        InteractionMatrix train = log.toMatrix(split.train());
        RankingEvaluation evaluation = new RankingEvaluation(settings.ks(), settings.aucLimit(), settings.threads());
        List<Map<String, Object>> selection = new ArrayList<>();

        // ALS grid on validation
        AlsConfig bestAls = null;
        double bestAlsValue = Double.NEGATIVE_INFINITY;
        for (int rank : settings.ranks()) {
            for (double lambda : settings.lambdas()) {
                for (double alpha : settings.alphas()) {
                    AlsConfig cfg = alsBase().withRank(rank).withLambda(lambda).withAlpha(alpha);
                    AlsModel m = new ImplicitAls(cfg).fit(inner);
                    double v = validate(evaluation, inner, validation.test(), m::scoreAll);
                    selection.add(entry(ALS, alsConfiguration(cfg), v));
                    if (v > bestAlsValue) {
                        bestAlsValue = v;
                        bestAls = cfg;
                    }
                    progress.step("ALS grid rank " + rank + " λ " + lambda + " α " + alpha);
                }
            }
        }
        AlsModel innerAls = new ImplicitAls(bestAls).fit(inner);

        // BPR rank on validation
        BprConfig bestBpr = null;
        double bestBprValue = Double.NEGATIVE_INFINITY;
        BprModel innerBpr = null;
        for (int rank : settings.ranks()) {
            BprConfig cfg = bprBase().withRank(rank);
            BprModel m = new Bpr(cfg).fit(inner);
            double v = validate(evaluation, inner, validation.test(), m::scoreAll);
            selection.add(entry(BPR, bprConfiguration(cfg), v));
            if (v > bestBprValue) {
                bestBprValue = v;
                bestBpr = cfg;
                innerBpr = m;
            }
            progress.step("BPR grid rank " + rank);
        }

        // semantic aggregation, blend weight and rank-fusion k on validation
        SemanticAggregation bestAggregation = SemanticAggregation.MEAN;
        double bestBlend = 0.5;
        double bestRrf = 60;
        if (neighbours != null) {
            double best = Double.NEGATIVE_INFINITY;
            for (SemanticAggregation a : SemanticAggregation.values()) {
                double v = validate(evaluation, inner, validation.test(),
                        new SemanticScorer(inner.byUser(), neighbours, a));
                selection.add(entry(SEMANTIC, Map.of("aggregation", a.name()), v));
                if (v > best) {
                    best = v;
                    bestAggregation = a;
                }
                progress.step("semantic " + a);
            }
            SemanticScorer innerSemantic = new SemanticScorer(inner.byUser(), neighbours, bestAggregation);
            best = Double.NEGATIVE_INFINITY;
            for (double w : settings.blendWeights()) {
                double v = validate(evaluation, inner, validation.test(),
                        new FusedScorer(innerAls::scoreAll, innerSemantic, inner.byUser(), FusionSettings.blend(w)));
                selection.add(entry(BLEND, Map.of("weight", w), v));
                if (v > best) {
                    best = v;
                    bestBlend = w;
                }
                progress.step("blend w " + w);
            }
            best = Double.NEGATIVE_INFINITY;
            for (double k : settings.rrfKs()) {
                double v = validate(evaluation, inner, validation.test(),
                        new FusedScorer(innerAls::scoreAll, innerSemantic, inner.byUser(), FusionSettings.rankFusion(k)));
                selection.add(entry(RANK_FUSION, Map.of("k", k), v));
                if (v > best) {
                    best = v;
                    bestRrf = k;
                }
                progress.step("rank fusion k " + k);
            }
        }

        // final fits on the whole training part
        List<Double> objective = new ArrayList<>();
        AlsModel als = new ImplicitAls(bestAls).fit(train, true, (done, total, value) -> objective.add(value));
        progress.step("ALS final fit");
        BprModel bpr = new Bpr(bestBpr).fit(train, TrainingListener.NONE);
        progress.step("BPR final fit");
        List<ModelResult> models = new ArrayList<>();
        models.add(result(evaluation, train, split, ALS, alsConfiguration(bestAls), als::scoreAll));
        models.add(result(evaluation, train, split, BPR, bprConfiguration(bestBpr), bpr::scoreAll));
        models.add(result(evaluation, train, split, POPULARITY, Map.of(), new PopularityScorer(train.byItem())));
        if (neighbours != null) {
            SemanticScorer semantic = new SemanticScorer(train.byUser(), neighbours, bestAggregation);
            Map<String, Object> semCfg = Map.of("aggregation", bestAggregation.name(), "neighbours", settings.neighbours());
            models.add(result(evaluation, train, split, SEMANTIC, semCfg, semantic));
            FusionSettings product = FusionSettings.product();
            models.add(result(evaluation, train, split, ALS_SEMANTIC, fusionConfiguration(product, alsConfiguration(bestAls), semCfg),
                    new FusedScorer(als::scoreAll, semantic, train.byUser(), product)));
            models.add(result(evaluation, train, split, BPR_SEMANTIC, fusionConfiguration(product, bprConfiguration(bestBpr), semCfg),
                    new FusedScorer(bpr::scoreAll, semantic, train.byUser(), product)));
            FusionSettings blend = FusionSettings.blend(bestBlend);
            models.add(result(evaluation, train, split, BLEND, fusionConfiguration(blend, alsConfiguration(bestAls), semCfg),
                    new FusedScorer(als::scoreAll, semantic, train.byUser(), blend)));
            FusionSettings rrf = FusionSettings.rankFusion(bestRrf);
            models.add(result(evaluation, train, split, RANK_FUSION, fusionConfiguration(rrf, alsConfiguration(bestAls), semCfg),
                    new FusedScorer(als::scoreAll, semantic, train.byUser(), rrf)));
        }
        progress.finish();

        Map<String, ConfidenceInterval> comparisons = new LinkedHashMap<>();
        ModelResult alsResult = find(models, ALS);
        ModelResult fused = neighbours == null ? null : find(models, ALS_SEMANTIC);
        if (fused != null) {
            for (String metric : List.of("mrr", settings.selectMetric())) {
                comparisons.put(ALS_SEMANTIC + " − " + ALS + " " + metric, Bootstrap.meanDifferenceInterval(
                        fused.perResearcher().get(metric), alsResult.perResearcher().get(metric),
                        settings.resamples(), settings.level(), settings.seed()));
            }
        }

        Map<String, Object> data = new LinkedHashMap<>();
        data.put("researchers", users);
        data.put("items", items);
        data.put("interactions", log.interactions().size());
        data.put("trainInteractions", split.train().size());
        data.put("testInteractions", split.test().size());
        data.put("evaluatedResearchers", alsResult.perResearcher().get("mrr").length);
        data.putAll(extraData);
        return new ExperimentReport(data, settings.splitter().describe(), settings.ks(), settings.selectMetric(),
                selection, models, comparisons, objective);
    }

    private AlsConfig alsBase() {
        return AlsConfig.defaults().withIterations(settings.iterations()).withThreads(settings.threads())
                .withSeed(settings.seed());
    }

    private BprConfig bprBase() {
        return BprConfig.defaults().withEpochs(settings.bprEpochs()).withThreads(settings.threads())
                .withSeed(settings.seed());
    }

    private double validate(RankingEvaluation evaluation, InteractionMatrix inner, List<Interaction> test,
                            ScoreFunction scorer) {
        double[] values = evaluation.perResearcher(inner.byUser(), test, scorer).get(settings.selectMetric());
        if (values == null) {
            throw new IllegalArgumentException("unknown selection metric " + settings.selectMetric());
        }
        return java.util.Arrays.stream(values).filter(Double::isFinite).average().orElse(0.0);
    }

    private ModelResult result(RankingEvaluation evaluation, InteractionMatrix train, Split split, String name,
                               Map<String, Object> configuration, ScoreFunction scorer) {
        Map<String, double[]> per = evaluation.perResearcher(train.byUser(), split.test(), scorer);
        Map<String, ConfidenceInterval> summary = evaluation.summarise(per, settings.resamples(), settings.level(),
                settings.seed());
        progress.step("evaluated " + name);
        return new ModelResult(name, configuration, summary, per);
    }

    private static ModelResult find(List<ModelResult> models, String name) {
        return models.stream().filter(m -> m.name().equals(name)).findFirst().orElseThrow();
    }

    private static Map<String, Object> entry(String model, Map<String, Object> configuration, double value) {
        Map<String, Object> e = new LinkedHashMap<>();
        e.put("model", model);
        e.put("configuration", configuration);
        e.put("value", value);
        return e;
    }

    static Map<String, Object> alsConfiguration(AlsConfig c) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("rank", c.rank());
        m.put("lambda", c.lambda());
        m.put("alpha", c.alpha());
        m.put("confidence", c.confidence().name());
        m.put("regularisation", c.regularisation().name());
        m.put("solver", c.solver().name());
        m.put("cgSteps", c.cgSteps());
        m.put("iterations", c.iterations());
        m.put("seed", c.seed());
        return m;
    }

    static Map<String, Object> bprConfiguration(BprConfig c) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("rank", c.rank());
        m.put("learningRate", c.learningRate());
        m.put("regUser", c.regUser());
        m.put("regPositive", c.regPositive());
        m.put("regNegative", c.regNegative());
        m.put("regBias", c.regBias());
        m.put("epochs", c.epochs());
        m.put("seed", c.seed());
        return m;
    }

    private static Map<String, Object> fusionConfiguration(FusionSettings f, Map<String, Object> cf,
                                                           Map<String, Object> semantic) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("rule", f.rule().name());
        if (f.rule() == FusionRule.BLEND) {
            m.put("weight", f.weight());
        } else if (f.rule() == FusionRule.RANK_FUSION) {
            m.put("k", f.rrfK());
        } else {
            m.put("epsilon", f.epsilon());
        }
        m.put("cf", cf);
        m.put("semantic", semantic);
        return m;
    }
}
