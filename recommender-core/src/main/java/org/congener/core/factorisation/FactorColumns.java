package org.congener.core.factorisation;

/**
 * Item factors Y (I items × k) laid out for the product Y·x in panels of {@link #PANEL} items: within a
 * panel, factor t's values of its items side by side, then factor t + 1's, and so on; the last panel
 * padded with zero items. In this layout a lane block of items times a broadcast x_t is one fused
 * multiply-add per lane, each item's score stays in its lane from the first factor to the last, and no
 * horizontal sum is needed (the row-major product sums each row across the lanes at the end, once per
 * item and vector). A panel is one contiguous run (8 KB as floats at k = 64) that the vector kernel
 * takes as one group of item blocks: with each factor's items side by side over the whole catalogue
 * instead, the same group read 64 short pieces 40 KB apart, which the hardware prefetcher did not
 * follow once Y had left the cache between batches (a batch of 8 took 49–56 µs per vector against
 * 23 µs in panels, BENCHMARKS.md). Held as floats when every entry of Y is a float value (published
 * factors are): half the bytes, the same bits out, since widening a float is exact. Immutable; a copy,
 * so later changes to Y do not reach it.
 */
public final class FactorColumns {
    /**
     * Items per panel: four lane blocks of eight doubles (the vector kernel's group), and a whole
     * number of lanes for every double vector of up to 1024 bits, so the kernels end each panel on a
     * whole vector (its padded lanes are computed and not stored).
     */
    static final int PANEL = 32;

    private final int items;
    private final int rank;
    private final int panels;
    /** Y in panels as floats, or null when some entry is not a float value. */
    private final float[] floats;
    /** Y in panels as doubles when {@link #floats} is null, else null. */
    private final double[] doubles;

    private FactorColumns(int items, int rank, int panels, float[] floats, double[] doubles) {
        this.items = items;
        this.rank = rank;
        this.panels = panels;
        this.floats = floats;
        this.doubles = doubles;
    }

    /** Y laid out in panels, as floats if that loses nothing, else as doubles. */
    public static FactorColumns of(FactorMatrix y) {
        int items = y.rows();
        int rank = y.rank();
        int panels = Math.addExact(items, PANEL - 1) / PANEL;
        double[] data = y.data();
        float[] narrow = new float[Math.multiplyExact(Math.multiplyExact(panels, PANEL), rank)];
        for (int i = 0; i < items; i++) {
            for (int t = 0; t < rank; t++) {
                double value = data[i * rank + t];
                int at = position(i, t, rank);
                narrow[at] = (float) value;
                // NaN != NaN: a factor matrix holding NaN is kept as doubles, which carry it unchanged
                if (narrow[at] != value) {
                    return new FactorColumns(items, rank, panels, null, widened(data, items, rank, panels));
                }
            }
        }
        return new FactorColumns(items, rank, panels, narrow, null);
    }

    private static double[] widened(double[] data, int items, int rank, int panels) {
        double[] wide = new double[Math.multiplyExact(Math.multiplyExact(panels, PANEL), rank)];
        for (int i = 0; i < items; i++) {
            for (int t = 0; t < rank; t++) {
                wide[position(i, t, rank)] = data[i * rank + t];
            }
        }
        return wide;
    }

    /** Where y_it is held: item i's panel, then factor t's row of the panel, then i's place in it. */
    private static int position(int item, int factor, int rank) {
        return (item / PANEL) * PANEL * rank + factor * PANEL + item % PANEL;
    }

    public int items() {
        return items;
    }

    public int rank() {
        return rank;
    }

    /** Items held, padding included: I rounded up to whole panels. */
    public int paddedItems() {
        return panels * PANEL;
    }

    /** Whether the factors are held as floats. */
    public boolean floats() {
        return floats != null;
    }

    /** y_it as held (item i, factor t); 0 for an item in the padding, i from I to {@link #paddedItems()}. */
    public double get(int item, int factor) {
        if (item < 0 || item >= paddedItems() || factor < 0 || factor >= rank) {
            throw new IndexOutOfBoundsException("item " + item + ", factor " + factor);
        }
        int at = position(item, factor, rank);
        return floats != null ? floats[at] : doubles[at];
    }

    /**
     * out[i] = x·y_i for i &lt; I by {@link DenseKernels#multiplyFactorMajor}: each a sequential chain of
     * fused multiply-adds over the factors in order from 0.0. Modifies {@code out}[0..I).
     */
    public void multiply(DenseKernels kernels, double[] x, double[] out) {
        check(x.length, out.length);
        for (int p = 0; p < panels; p++) {
            int first = p * PANEL;
            int rows = Math.min(PANEL, items - first);
            if (floats != null) {
                kernels.multiplyFactorMajor(floats, first * rank, rows, PANEL, rank, x, 0, out, first);
            } else {
                kernels.multiplyFactorMajor(doubles, first * rank, rows, PANEL, rank, x, 0, out, first);
            }
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
        for (int p = 0; p < panels; p++) {
            int first = p * PANEL;
            int rows = Math.min(PANEL, items - first);
            if (floats != null) {
                kernels.multiplyFactorMajorMany(floats, first * rank, rows, PANEL, rank, xs, count, outs, first);
            } else {
                kernels.multiplyFactorMajorMany(doubles, first * rank, rows, PANEL, rank, xs, count, outs, first);
            }
        }
    }

    private void check(int vector, int out) {
        if (vector < rank || out < items) {
            throw new IllegalArgumentException("vector of " + vector + " and scores of " + out + " for " + items
                    + " items at rank " + rank);
        }
    }
}
