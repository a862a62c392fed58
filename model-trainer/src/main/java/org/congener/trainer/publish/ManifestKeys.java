package org.congener.trainer.publish;

import java.util.LinkedHashMap;
import java.util.Map;
import org.congener.core.factorisation.AlsConfig;
import org.congener.core.factorisation.ConfidenceForm;
import org.congener.core.factorisation.Regularisation;
import org.congener.core.fusion.FusionSettings;
import org.congener.core.interactions.InteractionWeights;
import org.congener.schemas.UsageKind;

/**
 * The keys of {@code ModelManifest.fusionWeights}, per the model-version contract shared with the
 * streams app: every number the app needs to reproduce the trainer's scoring. Kept in this one place
 * so it can give way to the shared {@code ManifestSettings} of recommender-core once that exists.
 */
public final class ManifestKeys {
    public static final String FUSION_WEIGHT = "fusion.weight";
    public static final String FUSION_K = "fusion.k";
    public static final String FUSION_EPSILON = "fusion.epsilon";
    public static final String ALS_CONFIDENCE = "als.confidence";
    public static final String ALS_REGULARISATION = "als.regularisation";
    public static final String ALS_CG_STEPS = "als.cgSteps";
    public static final String WEIGHT_PREFIX = "weight.";
    public static final String QUANTITY_SCALE = "weight.quantityScale";
    public static final String HALF_LIFE_DAYS = "weight.halfLifeDays";

    private ManifestKeys() {
    }

    public static Map<String, Double> write(FusionSettings fusion, AlsConfig als, InteractionWeights weights) {
        Map<String, Double> m = new LinkedHashMap<>();
        m.put(FUSION_WEIGHT, fusion.weight());
        m.put(FUSION_K, fusion.rrfK());
        m.put(FUSION_EPSILON, fusion.epsilon());
        m.put(ALS_CONFIDENCE, als.confidence() == ConfidenceForm.LOG ? 1.0 : 0.0);
        m.put(ALS_REGULARISATION, als.regularisation() == Regularisation.PER_INTERACTION ? 1.0 : 0.0);
        m.put(ALS_CG_STEPS, (double) als.cgSteps());
        for (UsageKind kind : UsageKind.values()) {
            m.put(WEIGHT_PREFIX + kind.name(), weights.kindWeights().getOrDefault(kind, 0.0));
        }
        m.put(QUANTITY_SCALE, weights.quantityScale());
        m.put(HALF_LIFE_DAYS, weights.halfLife() == null ? 0.0 : weights.halfLife().toMillis() / 86_400_000.0);
        return m;
    }

    /** The fusion settings a manifest names; absent keys take the defaults of the rule. */
    public static FusionSettings fusion(org.congener.schemas.FusionRule rule, Map<String, Double> m) {
        FusionSettings d = FusionSettings.product();
        return new FusionSettings(rule, m.getOrDefault(FUSION_WEIGHT, d.weight()), m.getOrDefault(FUSION_K, d.rrfK()),
                m.getOrDefault(FUSION_EPSILON, d.epsilon()));
    }

    /** The ALS fold-in settings a manifest names, on top of {@code base}. */
    public static AlsConfig als(AlsConfig base, int rank, double lambda, double alpha, Map<String, Double> m) {
        return base.withRank(rank).withLambda(lambda).withAlpha(alpha)
                .withConfidence(m.getOrDefault(ALS_CONFIDENCE, 0.0) == 1.0 ? ConfidenceForm.LOG : ConfidenceForm.LINEAR)
                .withRegularisation(m.getOrDefault(ALS_REGULARISATION, 0.0) == 1.0
                        ? Regularisation.PER_INTERACTION : Regularisation.PLAIN)
                .withCgSteps((int) Math.round(m.getOrDefault(ALS_CG_STEPS, (double) base.cgSteps())));
    }
}
