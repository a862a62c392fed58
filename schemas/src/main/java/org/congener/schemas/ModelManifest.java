package org.congener.schemas;

import java.util.List;
import java.util.Map;

/**
 * The last record of a published model version; key {@code "current"} on {@code model-manifests}.
 * A version goes live only when this manifest and all {@code itemCount} factor records and
 * {@code neighbourCount} neighbour records of the same version are present.
 *
 * @param gram           YᵀY, row-major, rank × rank entries
 * @param fusionWeights  parameters of the fusion rule (e.g. {@code weight}, {@code k})
 * @param offlineMetrics metric name (e.g. {@code ndcg@10}) to value on the trainer's held-out split
 * @param checksum       hex SHA-256 over the factor records in compound-id order
 */
public record ModelManifest(String schema, String version, String createdAt, int rank, double lambda,
                            double alpha, int itemCount, int neighbourCount, List<Double> gram,
                            FusionRule fusionRule, Map<String, Double> fusionWeights,
                            Map<String, Double> offlineMetrics, String checksum) {
}
