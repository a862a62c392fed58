package org.congener.core.factorisation;

/**
 * Item factors Y (I items × k) laid out factor by factor for the product Y·x: factor t's values of
 * all I items side by side, each factor's block padded with zeros to {@link #stride()} items. In this
 * layout a lane block of items times a broadcast x_t is one fused multiply-add per lane, each item's
 * score stays in its lane from the first factor to the last, and no horizontal sum is needed (the
 * row-major product sums each row across the lanes at the end, once per item and vector). Held as
 * floats when every entry of Y is a float value (published factors are): half the bytes, the same
 * bits out, since widening a float is exact. Immutable; a copy, so later changes to Y do not reach it.
 */
public final class FactorColumns {
    /**
     * Items per factor block are a multiple of this, a whole number of lanes for every double vector of
     * up to 1024 bits, so the vector kernels end each block on a whole vector (its padded lanes are
     * computed and not stored) and never fall back to one item at a time.
     */
    static final int PAD = 16;

    private final int items;
    private final int rank;
    private final int stride;
    /** Y factor-major as floats, or null when some entry is not a float value. */
    private final float[] floats;
    /** Y factor-major as doubles when {@link #floats} is null, else null. */
    private final double[] doubles;

    private FactorColumns(int items, int rank, int stride, float[] floats, double[] doubles) {
        this.items = items;
        this.rank = rank;
        this.stride = stride;
        this.floats = floats;
        this.doubles = doubles;
    }

    /** Y laid out factor-major, as floats if that loses nothing, else as doubles. */
    public static FactorColumns of(FactorMatrix y) {
        int items = y.rows();
        int rank = y.rank();
        int stride = Math.addExact(items, PAD - 1) / PAD * PAD;
        double[] data = y.data();
        float[] narrow = new float[Math.multiplyExact(stride, rank)];
        for (int i = 0; i < items; i++) {
            for (int t = 0; t < rank; t++) {
                double value = data[i * rank + t];
                narrow[t * stride + i] = (float) value;
                // NaN != NaN: a factor matrix holding NaN is kept as doubles, which carry it unchanged
                if (narrow[t * stride + i] != value) {
                    return new FactorColumns(items, rank, stride, null, widened(data, items, rank, stride));
                }
            }
        }
        return new FactorColumns(items, rank, stride, narrow, null);
    }

    private static double[] widened(double[] data, int items, int rank, int stride) {
        double[] wide = new double[Math.multiplyExact(stride, rank)];
        for (int i = 0; i < items; i++) {
            for (int t = 0; t < rank; t++) {
                wide[t * stride + i] = data[i * rank + t];
            }
        }
        return wide;
    }

    public int items() {
        return items;
    }

    public int rank() {
        return rank;
    }

    /** Entries from one factor's block to the next: I rounded up to a multiple of {@link #PAD}. */
    public int stride() {
        return stride;
    }

    /** Whether the factors are held as floats. */
    public boolean floats() {
        return floats != null;
    }

    /** y_it as held (item i, factor t); 0 for an item in the padding, i from I to the stride. */
    public double get(int item, int factor) {
        int at = factor * stride + item;
        return floats != null ? floats[at] : doubles[at];
    }

    /**
     * out[i] = x·y_i for i &lt; I by {@link DenseKernels#multiplyFactorMajor}: each a sequential chain of
     * fused multiply-adds over the factors in order from 0.0. Modifies {@code out}[0..I).
     */
    public void multiply(DenseKernels kernels, double[] x, double[] out) {
        check(x.length, out.length);
        if (floats != null) {
            kernels.multiplyFactorMajor(floats, 0, items, stride, rank, x, 0, out, 0);
        } else {
            kernels.multiplyFactorMajor(doubles, 0, items, stride, rank, x, 0, out, 0);
        }
    }

    /**
     * outs[c][i] = xs[c]·y_i for c &lt; count in one pass over the factors, each column the bits of
     * {@link #multiply} with xs[c] ({@link DenseKernels#multiplyFactorMajorMany}). Modifies outs[0..count).
     */
    public void multiplyMany(DenseKernels kernels, double[][] xs, int count, double[][] outs) {
        if (count > xs.length || count > outs.length) {
            throw new IllegalArgumentException(count + " vectors, " + xs.length + " given, room for " + outs.length);
        }
        for (int c = 0; c < count; c++) {
            check(xs[c].length, outs[c].length);
        }
        if (floats != null) {
            kernels.multiplyFactorMajorMany(floats, 0, items, stride, rank, xs, count, outs, 0);
        } else {
            kernels.multiplyFactorMajorMany(doubles, 0, items, stride, rank, xs, count, outs, 0);
        }
    }

    private void check(int vector, int out) {
        if (vector < rank || out < items) {
            throw new IllegalArgumentException("vector of " + vector + " and scores of " + out + " for " + items
                    + " items at rank " + rank);
        }
    }
}
