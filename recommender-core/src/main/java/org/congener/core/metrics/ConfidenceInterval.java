package org.congener.core.metrics;

/** A metric's mean over researchers with a two-sided interval at {@code level} (e.g. 0.95). */
public record ConfidenceInterval(double mean, double lower, double upper, double level) {
}
