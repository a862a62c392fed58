package org.congener.trainer.evaluation;

import java.util.List;
import java.util.Map;
import org.congener.core.metrics.ConfidenceInterval;

/**
 * Everything {@code evaluate} reports.
 *
 * @param data         sizes: researchers, items, interactions, train, test, evaluated researchers, …
 * @param split        the split's description
 * @param ks           the cut-offs
 * @param selection    the validation grid: one entry per tried configuration with its validation value
 * @param models       results on the held-out split, in a fixed order
 * @param comparisons  paired differences (name → interval), e.g. ALS×semantic − ALS on MRR
 * @param alsObjective objective after each iteration of the final ALS fit
 */
public record ExperimentReport(Map<String, Object> data, String split, int[] ks, String selectMetric,
                               List<Map<String, Object>> selection, List<ModelResult> models,
                               Map<String, ConfidenceInterval> comparisons, List<Double> alsObjective) {
}
