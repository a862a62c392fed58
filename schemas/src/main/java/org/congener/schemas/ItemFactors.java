package org.congener.schemas;

/** Latent factor vector of one compound under one model version; key {@code compoundId}. */
public record ItemFactors(String schema, String version, String compoundId, float[] factors) {
}
