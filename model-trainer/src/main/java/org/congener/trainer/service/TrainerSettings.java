package org.congener.trainer.service;

import java.nio.file.Path;
import java.time.Duration;
import org.congener.core.interactions.InteractionWeights;
import org.congener.trainer.evaluation.ExperimentSettings;

/**
 * What one training run does.
 *
 * @param experiment   the offline experiment (split, grids, the metric the gate compares: its selectMetric)
 * @param weights      interaction weights, written into the manifest for the streams app
 * @param gateMargin   a candidate is published when it is at most this much worse than the live version
 * @param keepVersions how many versions stay on the broker (the live one is always kept)
 * @param reportDir    where {@code <version>/report.html} and {@code report.json} go; null for none
 * @param readTimeout  how long reading one topic to its end may take
 */
public record TrainerSettings(ExperimentSettings experiment, InteractionWeights weights, double gateMargin,
                              int keepVersions, Path reportDir, Duration readTimeout) {
    public TrainerSettings {
        if (!(gateMargin >= 0) || !Double.isFinite(gateMargin)) {
            throw new IllegalArgumentException("gate margin must be finite and >= 0: " + gateMargin);
        }
        if (keepVersions < 1) {
            throw new IllegalArgumentException("keep at least one version, not " + keepVersions);
        }
    }

    public String gateMetric() {
        return experiment.selectMetric();
    }

    public TrainerSettings withExperiment(ExperimentSettings e) {
        return new TrainerSettings(e, weights, gateMargin, keepVersions, reportDir, readTimeout);
    }

    public TrainerSettings withGateMargin(double m) {
        return new TrainerSettings(experiment, weights, m, keepVersions, reportDir, readTimeout);
    }

    public TrainerSettings withKeepVersions(int n) {
        return new TrainerSettings(experiment, weights, gateMargin, n, reportDir, readTimeout);
    }

    public TrainerSettings withReportDir(Path p) {
        return new TrainerSettings(experiment, weights, gateMargin, keepVersions, p, readTimeout);
    }
}
