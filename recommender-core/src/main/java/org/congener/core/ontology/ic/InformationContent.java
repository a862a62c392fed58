package org.congener.core.ontology.ic;

import java.util.Arrays;

/**
 * The information content (IC) of every node of one ontology, as computed by one method. Every method here
 * gives a value that never grows from a term to its ancestors, which the similarity measures and the
 * neighbour cache's pruning rely on.
 */
public final class InformationContent {
    private final String method;
    private final double[] values;
    private final double max;

    /** @param values IC per dense term id; copied */
    public InformationContent(String method, double[] values) {
        this.method = method;
        this.values = values.clone();
        double largest = 0;
        for (double value : this.values) {
            if (!Double.isFinite(value) || value < 0) {
                throw new IllegalArgumentException("information content must be finite and >= 0, found " + value);
            }
            largest = Math.max(largest, value);
        }
        this.max = largest;
    }

    /** IC of one term. */
    public double of(int term) {
        return values[term];
    }

    /** The largest IC of any term; measures divide by it to land in [0, 1]. */
    public double max() {
        return max;
    }

    /** Short name of the method, e.g. {@code intrinsic-seco}. */
    public String method() {
        return method;
    }

    public int size() {
        return values.length;
    }

    public double[] toArray() {
        return Arrays.copyOf(values, values.length);
    }
}
