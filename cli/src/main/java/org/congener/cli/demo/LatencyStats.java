package org.congener.cli.demo;

import java.util.Arrays;
import java.util.Map;

/**
 * Time from the broker's acknowledgement of a usage event until its suggestion list was read from the
 * {@code suggestions} topic (read committed), over every event seen on both sides. Percentiles by the
 * nearest-rank method (common practice).
 */
public record LatencyStats(int count, double p50Ms, double p95Ms, double p99Ms, double maxMs) {

    public static LatencyStats of(Map<String, Long> ackedAtNanos, Map<String, Long> seenAtNanos) {
        double[] millis = ackedAtNanos.entrySet().stream()
                .filter(e -> seenAtNanos.containsKey(e.getKey()))
                .mapToDouble(e -> (seenAtNanos.get(e.getKey()) - e.getValue()) / 1e6)
                .sorted()
                .toArray();
        if (millis.length == 0) {
            return new LatencyStats(0, 0, 0, 0, 0);
        }
        return new LatencyStats(millis.length, rank(millis, 0.50), rank(millis, 0.95), rank(millis, 0.99),
                millis[millis.length - 1]);
    }

    /** Nearest rank: the smallest value with at least {@code q} of all values at or below it. */
    static double rank(double[] sorted, double q) {
        int index = (int) Math.ceil(q * sorted.length) - 1;
        return sorted[Math.max(0, Math.min(sorted.length - 1, index))];
    }

    @Override
    public String toString() {
        return Arrays.toString(new double[] {p50Ms, p95Ms, p99Ms, maxMs});
    }
}
