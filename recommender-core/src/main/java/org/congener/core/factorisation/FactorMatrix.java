package org.congener.core.factorisation;

import java.util.Arrays;
import java.util.SplittableRandom;

/** n rows of k factors, row-major in one array so a row is addressed as {@code data[row·k ..]}. */
public final class FactorMatrix {
    private final int rows;
    private final int rank;
    private final double[] data;

    public FactorMatrix(int rows, int rank) {
        this(rows, rank, new double[Math.multiplyExact(rows, rank)]);
    }

    /** Wraps {@code data} without copying. */
    public FactorMatrix(int rows, int rank, double[] data) {
        if (rank <= 0 || rows < 0 || data.length != (long) rows * rank) {
            throw new IllegalArgumentException("data length " + data.length + " is not " + rows + " × " + rank);
        }
        this.rows = rows;
        this.rank = rank;
        this.data = data;
    }

    /**
     * Gaussian rows scaled by 1/√k, so a row has norm near 1, as Spark's ALS starts (there each row is
     * normalised exactly). Row r draws from its own stream of {@code seed}, so the result does not
     * depend on the number of threads.
     */
    public static FactorMatrix random(int rows, int rank, long seed) {
        FactorMatrix m = new FactorMatrix(rows, rank);
        double scale = 1.0 / Math.sqrt(rank);
        for (int r = 0; r < rows; r++) {
            SplittableRandom random = new SplittableRandom(seed * 0x9E3779B97F4A7C15L + r);
            for (int f = 0; f < rank; f++) {
                m.data[r * rank + f] = gaussian(random) * scale;
            }
        }
        return m;
    }

    static double gaussian(SplittableRandom random) {
        // Box–Muller (common practice); SplittableRandom has no nextGaussian in Java 17.
        double u1 = 1.0 - random.nextDouble();
        double u2 = random.nextDouble();
        return Math.sqrt(-2.0 * Math.log(u1)) * Math.cos(2 * Math.PI * u2);
    }

    public int rows() {
        return rows;
    }

    public int rank() {
        return rank;
    }

    /** The shared backing array; rows are modified in place by the trainer. */
    public double[] data() {
        return data;
    }

    public int offset(int row) {
        return row * rank;
    }

    public double get(int row, int factor) {
        return data[row * rank + factor];
    }

    public double[] row(int row) {
        return Arrays.copyOfRange(data, row * rank, (row + 1) * rank);
    }

    public void setRow(int row, double[] values) {
        System.arraycopy(values, 0, data, row * rank, rank);
    }

    public FactorMatrix copy() {
        return new FactorMatrix(rows, rank, data.clone());
    }

    /** True when every entry is finite; the trainer refuses to publish factors otherwise. */
    public boolean allFinite() {
        for (double v : data) {
            if (!Double.isFinite(v)) {
                return false;
            }
        }
        return true;
    }

    /** x_u · y_i over the first {@code rank} factors of two matrices of equal rank. */
    public static double dot(FactorMatrix a, int rowA, FactorMatrix b, int rowB) {
        return DenseKernels.best().dot(a.data, rowA * a.rank, b.data, rowB * b.rank, a.rank);
    }
}
