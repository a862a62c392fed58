package org.congener.schemas;

/** Where a suggestion list came from. */
public enum SuggestionSource {
    /** the live model version's fusion of CF and semantic scores */
    HYBRID,
    /** no model version is live yet: semantic similarity and popularity only */
    SEMANTIC_AND_POPULARITY,
    /** a plain popularity list for a researcher with no usable history */
    POPULARITY
}
