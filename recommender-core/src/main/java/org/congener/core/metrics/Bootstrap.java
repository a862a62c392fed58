package org.congener.core.metrics;

import java.util.Arrays;
import java.util.SplittableRandom;

/**
 * Percentile bootstrap interval of a mean over researchers (Efron &amp; Tibshirani 1993, An
 * Introduction to the Bootstrap, chapter 13): resample the per-researcher values with replacement
 * {@code resamples} times, take the mean of each resample, report the (1−level)/2 and (1+level)/2
 * quantiles of those means. Seeded, so a report is reproducible.
 */
public final class Bootstrap {
    private Bootstrap() {
    }

    public static ConfidenceInterval meanInterval(double[] values, int resamples, double level, long seed) {
        if (values.length == 0) {
            return new ConfidenceInterval(Double.NaN, Double.NaN, Double.NaN, level);
        }
        if (resamples < 1 || !(level > 0 && level < 1)) {
            throw new IllegalArgumentException("resamples >= 1 and 0 < level < 1 required");
        }
        double mean = Arrays.stream(values).average().orElse(Double.NaN);
        double[] means = new double[resamples];
        SplittableRandom random = new SplittableRandom(seed);
        for (int b = 0; b < resamples; b++) {
            double sum = 0;
            for (int t = 0; t < values.length; t++) {
                sum += values[random.nextInt(values.length)];
            }
            means[b] = sum / values.length;
        }
        Arrays.sort(means);
        return new ConfidenceInterval(mean, quantile(means, (1 - level) / 2), quantile(means, (1 + level) / 2), level);
    }

    /** Paired interval of the mean difference a − b over the same researchers (same resampled indexes). */
    public static ConfidenceInterval meanDifferenceInterval(double[] a, double[] b, int resamples, double level,
                                                            long seed) {
        if (a.length != b.length) {
            throw new IllegalArgumentException("paired values differ in length");
        }
        double[] diff = new double[a.length];
        for (int t = 0; t < a.length; t++) {
            diff[t] = a[t] - b[t];
        }
        return meanInterval(diff, resamples, level, seed);
    }

    /** Linear interpolation between order statistics (type 7 of Hyndman &amp; Fan 1996). */
    static double quantile(double[] sorted, double q) {
        double pos = q * (sorted.length - 1);
        int lo = (int) Math.floor(pos);
        int hi = Math.min(sorted.length - 1, lo + 1);
        return sorted[lo] + (pos - lo) * (sorted[hi] - sorted[lo]);
    }
}
