package org.congener.schemas;

/**
 * Online quality of the live suggestions over one time window; key {@code windowStart}.
 *
 * @param hitRateAtN       share of usage events in the window whose compound was in the researcher's
 *                         last published top-N
 * @param scoreShiftPsi    population stability index of fused scores against the reference window
 * @param catalogCoverage  share of active compounds that appear in any published top-N in the window
 * @param modelAgeSeconds  age of the live model version at the window's end
 */
public record DriftMetrics(String schema, String windowStart, String windowEnd, String modelVersion, int n,
                           long events, double hitRateAtN, double scoreShiftPsi, double catalogCoverage,
                           long modelAgeSeconds) {
}
