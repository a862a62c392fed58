package org.congener.trainer.evaluation;

import java.util.Map;
import org.congener.core.metrics.ConfidenceInterval;

/**
 * One model's evaluation on the held-out split: its name, chosen configuration, per-metric mean with
 * bootstrap interval, and the per-researcher values (researchers in ascending order) for paired
 * comparisons.
 */
public record ModelResult(String name, Map<String, Object> configuration, Map<String, ConfidenceInterval> metrics,
                          Map<String, double[]> perResearcher) {
}
