package org.congener.schemas;

/** How collaborative-filtering and semantic scores are combined into one ranking score. */
public enum FusionRule {
    /** normalised CF score times semantic score */
    PRODUCT,
    /** w·CF + (1−w)·semantic on normalised scores */
    BLEND,
    /** reciprocal-rank fusion of the two rankings */
    RANK_FUSION,
    CF_ONLY,
    SEMANTIC_ONLY
}
