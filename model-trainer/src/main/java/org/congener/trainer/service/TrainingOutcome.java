package org.congener.trainer.service;

import java.nio.file.Path;
import java.util.List;

/**
 * The result of one training run, for the log, the summary screen and tests.
 *
 * @param version        the version published, or null when the gate refused
 * @param candidateName  the model the trainer chose (e.g. {@code ALS×semantic})
 * @param removed        versions dropped by retention in this run
 * @param report         directory of this run's report, or null
 */
public record TrainingOutcome(String version, String candidateName, ChosenModel candidate, GateDecision gate,
                              int events, int researchers, int compounds, int skippedRecords, List<String> removed,
                              Path report, long millis) {
    public boolean published() {
        return version != null;
    }
}
