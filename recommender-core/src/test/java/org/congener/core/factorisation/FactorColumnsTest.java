package org.congener.core.factorisation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class FactorColumnsTest {

    /** Y with every entry rounded to a float, as published factors are. */
    private static FactorMatrix floatValued(int items, int rank, long seed) {
        FactorMatrix y = FactorMatrix.random(items, rank, seed);
        double[] data = y.data();
        for (int t = 0; t < data.length; t++) {
            data[t] = (float) data[t];
        }
        return y;
    }

    @Test
    void shouldHoldEveryFactorOfEveryItemAndZerosInTheLastPanelsPadding() {
        for (int items : new int[] {0, 1, 15, 16, 17, 257}) {
            for (boolean floats : new boolean[] {true, false}) {
                FactorMatrix y = floats ? floatValued(items, 13, 3L) : FactorMatrix.random(items, 13, 3L);
                FactorColumns columns = FactorColumns.of(y);
                // an empty catalogue has no entry that is not a float value
                assertEquals(floats || items == 0, columns.floats(), items + " items");
                assertEquals(items, columns.items());
                assertEquals(13, columns.rank());
                assertTrue(columns.paddedItems() >= items && columns.paddedItems() < items + FactorColumns.PANEL);
                assertEquals(0, columns.paddedItems() % FactorColumns.PANEL);
                for (int t = 0; t < 13; t++) {
                    for (int i = 0; i < columns.paddedItems(); i++) {
                        double expected = i < items ? y.get(i, t) : 0.0;
                        assertEquals(Double.doubleToRawLongBits(expected),
                                Double.doubleToRawLongBits(columns.get(i, t)), "item " + i + ", factor " + t);
                    }
                }
            }
        }
    }

    @Test
    void shouldKeepDoublesWhenASingleEntryIsNotAFloatValue() {
        FactorMatrix y = floatValued(40, 8, 5L);
        assertTrue(FactorColumns.of(y).floats());
        // the last entry read, so the whole matrix was taken as floats before it
        y.data()[y.data().length - 1] = Math.nextUp((double) (float) y.get(39, 7));
        FactorColumns columns = FactorColumns.of(y);
        assertFalse(columns.floats());
        assertEquals(y.get(39, 7), columns.get(39, 7));
        assertEquals(y.get(0, 0), columns.get(0, 0));
    }

    @Test
    void shouldScoreEveryItemAsTheKernelDoesAndTheSameForOneVectorAloneAndInABatch() {
        for (boolean floats : new boolean[] {true, false}) {
            FactorMatrix y = floats ? floatValued(101, 9, 7L) : FactorMatrix.random(101, 9, 7L);
            FactorColumns columns = FactorColumns.of(y);
            double[][] xs = new double[6][];
            for (int c = 0; c < xs.length; c++) {
                xs[c] = FactorMatrix.random(1, 9, 20L + c).row(0);
            }
            double[][] outs = new double[6][101];
            columns.multiplyMany(DenseKernels.best(), xs, 5, outs);
            for (int c = 0; c < xs.length; c++) {
                double[] alone = new double[101];
                columns.multiply(DenseKernels.best(), xs[c], alone);
                for (int i = 0; i < 101; i++) {
                    double chain = 0.0;
                    for (int t = 0; t < 9; t++) {
                        chain = Math.fma(y.get(i, t), xs[c][t], chain);
                    }
                    assertEquals(Double.doubleToRawLongBits(chain), Double.doubleToRawLongBits(alone[i]),
                            "alone, vector " + c + ", item " + i);
                    double inBatch = c < 5 ? chain : 0.0;
                    assertEquals(Double.doubleToRawLongBits(inBatch), Double.doubleToRawLongBits(outs[c][i]),
                            "batch, vector " + c + ", item " + i);
                }
            }
        }
    }

    @Test
    void shouldRefuseVectorsAndOutputsTooShortForTheModel() {
        FactorColumns columns = FactorColumns.of(FactorMatrix.random(20, 4, 1L));
        DenseKernels kernels = DenseKernels.best();
        assertThrows(IllegalArgumentException.class, () -> columns.multiply(kernels, new double[3], new double[20]));
        assertThrows(IllegalArgumentException.class, () -> columns.multiply(kernels, new double[4], new double[19]));
        assertThrows(IllegalArgumentException.class,
                () -> columns.multiplyMany(kernels, new double[2][4], 3, new double[3][20]));
        assertThrows(IllegalArgumentException.class,
                () -> columns.multiplyMany(kernels, new double[][] {new double[4], new double[3]}, 2,
                        new double[2][20]));
    }
}
