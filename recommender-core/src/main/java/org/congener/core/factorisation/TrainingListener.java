package org.congener.core.factorisation;

/** Told after each training iteration or epoch, e.g. to draw a progress bar. */
@FunctionalInterface
public interface TrainingListener {
    TrainingListener NONE = (done, total, objective) -> { };

    /** @param objective the objective after this iteration, or NaN when not tracked */
    void iterationDone(int done, int total, double objective);
}
