package org.congener.core.fusion;

import java.time.Duration;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.Map;
import org.congener.core.factorisation.AlsConfig;
import org.congener.core.factorisation.ConfidenceForm;
import org.congener.core.factorisation.Regularisation;
import org.congener.core.factorisation.SolverKind;
import org.congener.core.interactions.InteractionWeights;
import org.congener.schemas.FusionRule;
import org.congener.schemas.ModelManifest;
import org.congener.schemas.UsageKind;

/**
 * The numbers a model manifest's {@code fusionWeights} map carries so that the streaming side scores
 * exactly as the trainer did: the fusion parameters, the fold-in settings of ALS and the interaction
 * weights. The trainer writes the map and the streams app reads it through this one class, so the keys
 * live in one place.
 *
 * <p>Keys: {@code fusion.weight}, {@code fusion.k}, {@code fusion.epsilon}, {@code fusion.rule} (ordinal
 * of {@link FusionRule}; the manifest's own {@code fusionRule} field wins when present);
 * {@code als.confidence} (0 = LINEAR, 1 = LOG), {@code als.regularisation} (0 = PLAIN,
 * 1 = PER_INTERACTION), {@code als.cgSteps}, {@code als.epsilon} (ε of the log confidence; 1 when
 * absent); {@code weight.ORDER}, {@code weight.WITHDRAWAL}, {@code weight.USAGE_LOG}, {@code weight.VIEW},
 * {@code weight.quantityScale}, {@code weight.halfLifeDays} (0 = no decay).
 *
 * @param fusion  the fusion rule and its parameters
 * @param foldIn  the ALS settings fold-in needs beyond rank, λ and α (which the manifest holds)
 * @param weights how events add to interaction strengths
 */
public record ManifestSettings(FusionSettings fusion, FoldInSettings foldIn, InteractionWeights weights) {

    public static final String FUSION_WEIGHT = "fusion.weight";
    public static final String FUSION_K = "fusion.k";
    public static final String FUSION_EPSILON = "fusion.epsilon";
    public static final String FUSION_RULE = "fusion.rule";
    public static final String ALS_CONFIDENCE = "als.confidence";
    public static final String ALS_REGULARISATION = "als.regularisation";
    public static final String ALS_CG_STEPS = "als.cgSteps";
    public static final String ALS_EPSILON = "als.epsilon";
    public static final String WEIGHT_PREFIX = "weight.";
    public static final String WEIGHT_QUANTITY_SCALE = "weight.quantityScale";
    public static final String WEIGHT_HALF_LIFE_DAYS = "weight.halfLifeDays";

    private static final double SECONDS_PER_DAY = 86_400.0;

    /**
     * The ALS settings of fold-in that a manifest does not carry as fields of its own.
     *
     * @param confidence     linear or log confidence
     * @param regularisation plain λ or λ·n_u
     * @param cgSteps        conjugate-gradient steps of the warm fold-in (≥ 1)
     * @param epsilon        ε of the log confidence (&gt; 0)
     */
    public record FoldInSettings(ConfidenceForm confidence, Regularisation regularisation, int cgSteps,
                                 double epsilon) {
        public FoldInSettings {
            if (confidence == null || regularisation == null) {
                throw new IllegalArgumentException("confidence form and regularisation must be given");
            }
            if (cgSteps < 1) {
                throw new IllegalArgumentException("cgSteps must be >= 1: " + cgSteps);
            }
            if (!(epsilon > 0) || !Double.isFinite(epsilon)) {
                throw new IllegalArgumentException("epsilon must be finite and > 0: " + epsilon);
            }
        }

        public static FoldInSettings of(AlsConfig als) {
            return new FoldInSettings(als.confidence(), als.regularisation(), als.cgSteps(), als.epsilon());
        }

        /** The full ALS configuration for fold-in under a version of the given rank, λ and α. */
        public AlsConfig toConfig(int rank, double lambda, double alpha) {
            return new AlsConfig(rank, lambda, alpha, epsilon, confidence, regularisation,
                    SolverKind.CONJUGATE_GRADIENT, cgSteps, 1, 0L, 1);
        }
    }

    public ManifestSettings {
        if (fusion == null || foldIn == null || weights == null) {
            throw new IllegalArgumentException("fusion, fold-in and weights must be given");
        }
    }

    /** The map to put under a manifest's {@code fusionWeights}. */
    public static Map<String, Double> write(FusionSettings fusion, AlsConfig als, InteractionWeights weights) {
        Map<String, Double> map = new LinkedHashMap<>();
        map.put(FUSION_WEIGHT, fusion.weight());
        map.put(FUSION_K, fusion.rrfK());
        map.put(FUSION_EPSILON, fusion.epsilon());
        map.put(FUSION_RULE, (double) fusion.rule().ordinal());
        map.put(ALS_CONFIDENCE, (double) als.confidence().ordinal());
        map.put(ALS_REGULARISATION, (double) als.regularisation().ordinal());
        map.put(ALS_CG_STEPS, (double) als.cgSteps());
        map.put(ALS_EPSILON, als.epsilon());
        for (UsageKind kind : UsageKind.values()) {
            map.put(WEIGHT_PREFIX + kind.name(), weights.kindWeights().get(kind));
        }
        map.put(WEIGHT_QUANTITY_SCALE, weights.quantityScale());
        map.put(WEIGHT_HALF_LIFE_DAYS, weights.halfLife() == null ? 0.0
                : weights.halfLife().toMillis() / 1000.0 / SECONDS_PER_DAY);
        return map;
    }

    /** Reads a {@code fusionWeights} map; a missing or out-of-range key is an IllegalArgumentException naming it. */
    public static ManifestSettings read(Map<String, Double> map) {
        FusionRule rule = enumAt(FusionRule.values(), map, FUSION_RULE);
        return read(rule, map);
    }

    /** Reads a manifest: its {@code fusionRule} field and its {@code fusionWeights} map. */
    public static ManifestSettings of(ModelManifest manifest) {
        FusionRule rule = manifest.fusionRule() != null ? manifest.fusionRule()
                : enumAt(FusionRule.values(), manifest.fusionWeights(), FUSION_RULE);
        return read(rule, manifest.fusionWeights());
    }

    private static ManifestSettings read(FusionRule rule, Map<String, Double> map) {
        if (map == null) {
            throw new IllegalArgumentException("manifest carries no fusionWeights map");
        }
        FusionSettings fusion = new FusionSettings(rule, required(map, FUSION_WEIGHT), required(map, FUSION_K),
                required(map, FUSION_EPSILON));
        Double epsilon = map.get(ALS_EPSILON);
        FoldInSettings foldIn = new FoldInSettings(
                enumAt(ConfidenceForm.values(), map, ALS_CONFIDENCE),
                enumAt(Regularisation.values(), map, ALS_REGULARISATION),
                wholeNumber(map, ALS_CG_STEPS),
                epsilon == null ? 1.0 : epsilon);
        Map<UsageKind, Double> kindWeights = new EnumMap<>(UsageKind.class);
        for (UsageKind kind : UsageKind.values()) {
            kindWeights.put(kind, required(map, WEIGHT_PREFIX + kind.name()));
        }
        double halfLifeDays = required(map, WEIGHT_HALF_LIFE_DAYS);
        if (halfLifeDays < 0) {
            throw new IllegalArgumentException(WEIGHT_HALF_LIFE_DAYS + " must be >= 0: " + halfLifeDays);
        }
        Duration halfLife = halfLifeDays == 0 ? null
                : Duration.ofMillis(Math.round(halfLifeDays * SECONDS_PER_DAY * 1000.0));
        InteractionWeights weights = new InteractionWeights(kindWeights, required(map, WEIGHT_QUANTITY_SCALE), halfLife);
        return new ManifestSettings(fusion, foldIn, weights);
    }

    private static double required(Map<String, Double> map, String key) {
        Double v = map.get(key);
        if (v == null || !Double.isFinite(v)) {
            throw new IllegalArgumentException("manifest fusionWeights lacks a finite " + key + ": " + v);
        }
        return v;
    }

    private static int wholeNumber(Map<String, Double> map, String key) {
        double v = required(map, key);
        if (v != Math.rint(v) || v > Integer.MAX_VALUE || v < Integer.MIN_VALUE) {
            throw new IllegalArgumentException("manifest fusionWeights " + key + " must be a whole number: " + v);
        }
        return (int) v;
    }

    private static <E extends Enum<E>> E enumAt(E[] values, Map<String, Double> map, String key) {
        if (map == null) {
            throw new IllegalArgumentException("manifest carries no fusionWeights map");
        }
        int i = wholeNumber(map, key);
        if (i < 0 || i >= values.length) {
            throw new IllegalArgumentException("manifest fusionWeights " + key + " out of range: " + i);
        }
        return values[i];
    }
}
