package org.congener.core.fusion;

/**
 * Several researchers' folded-in vectors x_1 … x_B under one model, waiting to be scored together:
 * {@link ResearcherScoring#multiplyBatch} computes Y·[x_1 … x_B] with one pass over the item factors
 * instead of one pass per researcher. At 10,000 × 64 the factors (2.56 MB as floats) do not stay in
 * cache between the events of a busy stream thread, so one pass per event is bound by memory; one pass
 * per batch is not. The factors are laid out factor by factor in panels of items ({@link
 * org.congener.core.factorisation.FactorColumns}), so a lane block of items times a broadcast factor
 * of x is one fused multiply-add and no score needs a horizontal sum; each block of factors is
 * loaded and widened once for a group of the batch's vectors, which keeps the multiply-add pipes
 * rather than the loads and conversions busy. Made by {@link ResearcherScoring#newBatch}; not
 * thread-safe.
 */
public final class ScoringBatch {
    final double[][] vectors;
    /** CF scores per column after {@link ResearcherScoring#multiplyBatch}; a column is handed over once. */
    final double[][] cf;
    private final int itemCount;
    int size;
    boolean multiplied;

    ScoringBatch(int capacity, int itemCount, int rank) {
        if (capacity < 1) {
            throw new IllegalArgumentException("a batch holds at least one researcher, not " + capacity);
        }
        this.itemCount = itemCount;
        this.vectors = new double[capacity][rank];
        this.cf = new double[capacity][itemCount];
    }

    public int capacity() {
        return vectors.length;
    }

    public int size() {
        return size;
    }

    public boolean isFull() {
        return size == vectors.length;
    }

    /** True when this batch was made for a model of this catalogue size and rank. */
    public boolean fits(int items, int rank) {
        return items == itemCount && rank == vectors[0].length;
    }

    /** Adds a copy of x_u as the next column and returns its index. */
    public int add(double[] vector) {
        if (isFull()) {
            throw new IllegalStateException("batch is full at " + size);
        }
        if (vector.length != vectors[0].length) {
            throw new IllegalArgumentException("vector has " + vector.length + " entries, rank is " + vectors[0].length);
        }
        System.arraycopy(vector, 0, vectors[size], 0, vector.length);
        multiplied = false;
        return size++;
    }

    /** Empties the batch for the next one; the arrays are kept. */
    public void clear() {
        size = 0;
        multiplied = false;
    }
}
