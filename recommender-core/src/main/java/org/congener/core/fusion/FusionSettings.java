package org.congener.core.fusion;

import org.congener.schemas.FusionRule;

/**
 * A fusion rule and its parameters.
 *
 * @param rule    how CF and semantic scores combine
 * @param weight  w of the blend, in [0, 1]: w·CF + (1 − w)·semantic
 * @param rrfK    k of reciprocal-rank fusion (&gt; 0; 60 in Cormack, Clarke &amp; Büttcher 2009)
 * @param epsilon floor added to the semantic score in the product (≥ 0), so CF still orders the items
 *                on which the ontology is silent
 */
public record FusionSettings(FusionRule rule, double weight, double rrfK, double epsilon) {
    public FusionSettings {
        if (rule == null) {
            throw new IllegalArgumentException("fusion rule must be given");
        }
        if (!(weight >= 0 && weight <= 1)) {
            throw new IllegalArgumentException("blend weight must be in [0, 1]: " + weight);
        }
        if (!(rrfK > 0)) {
            throw new IllegalArgumentException("rank-fusion k must be > 0: " + rrfK);
        }
        if (!(epsilon >= 0)) {
            throw new IllegalArgumentException("epsilon must be >= 0: " + epsilon);
        }
    }

    public static FusionSettings product() {
        return new FusionSettings(FusionRule.PRODUCT, 0.5, 60, 1e-3);
    }

    public static FusionSettings blend(double weight) {
        return new FusionSettings(FusionRule.BLEND, weight, 60, 1e-3);
    }

    public static FusionSettings rankFusion(double k) {
        return new FusionSettings(FusionRule.RANK_FUSION, 0.5, k, 1e-3);
    }
}
