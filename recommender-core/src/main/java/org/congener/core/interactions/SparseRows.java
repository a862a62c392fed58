package org.congener.core.interactions;

/**
 * A sparse matrix in compressed sparse row form: row r holds columns {@code columns[rowStart[r] ..
 * rowStart[r+1])} with their {@code values}, columns ascending within a row. Immutable by convention:
 * the arrays are shared, not copied, so callers must not modify them.
 */
public final class SparseRows {
    private final int rowCount;
    private final int columnCount;
    private final int[] rowStart;
    private final int[] columns;
    private final double[] values;

    public SparseRows(int rowCount, int columnCount, int[] rowStart, int[] columns, double[] values) {
        if (rowStart.length != rowCount + 1 || columns.length != values.length
                || rowStart[rowCount] != columns.length) {
            throw new IllegalArgumentException("inconsistent CSR arrays");
        }
        this.rowCount = rowCount;
        this.columnCount = columnCount;
        this.rowStart = rowStart;
        this.columns = columns;
        this.values = values;
    }

    public int rowCount() {
        return rowCount;
    }

    public int columnCount() {
        return columnCount;
    }

    public int nonZeroCount() {
        return columns.length;
    }

    public int rowStart(int row) {
        return rowStart[row];
    }

    public int rowEnd(int row) {
        return rowStart[row + 1];
    }

    public int rowLength(int row) {
        return rowStart[row + 1] - rowStart[row];
    }

    public int column(int position) {
        return columns[position];
    }

    public double value(int position) {
        return values[position];
    }

    /** The shared column array; read only. */
    public int[] columnArray() {
        return columns;
    }

    /** The shared value array; read only. */
    public double[] valueArray() {
        return values;
    }

    /** Copies the columns of one row. */
    public int[] rowColumns(int row) {
        return java.util.Arrays.copyOfRange(columns, rowStart[row], rowStart[row + 1]);
    }

    /** Copies the values of one row. */
    public double[] rowValues(int row) {
        return java.util.Arrays.copyOfRange(values, rowStart[row], rowStart[row + 1]);
    }

    /** True when {@code column} is stored in {@code row} (binary search). */
    public boolean contains(int row, int column) {
        return java.util.Arrays.binarySearch(columns, rowStart[row], rowStart[row + 1], column) >= 0;
    }

    /** The transpose, again in CSR form (so the other orientation of the same matrix). */
    public SparseRows transpose() {
        int[] counts = new int[columnCount + 1];
        for (int c : columns) {
            counts[c + 1]++;
        }
        for (int c = 0; c < columnCount; c++) {
            counts[c + 1] += counts[c];
        }
        int[] start = counts.clone();
        int[] next = counts.clone();
        int[] tColumns = new int[columns.length];
        double[] tValues = new double[values.length];
        for (int r = 0; r < rowCount; r++) {
            for (int p = rowStart[r]; p < rowStart[r + 1]; p++) {
                int slot = next[columns[p]]++;
                tColumns[slot] = r;
                tValues[slot] = values[p];
            }
        }
        return new SparseRows(columnCount, rowCount, start, tColumns, tValues);
    }
}
