package org.congener.core.factorisation;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;

/**
 * The kernels' min and max against a plain {@link Math#min} / {@link Math#max} fold, bit for bit, over
 * runs of every length around the lane count, with zeros of both signs, NaNs and infinities mixed in.
 */
class KernelMinMaxTest {

    @Test
    void shouldEqualTheMathMinAndMaxFoldBitForBitWhenRunsHoldSignedZerosNaNsAndInfinities() {
        SplittableRandom random = new SplittableRandom(5);
        double[] specials = {0.0, -0.0, Double.NaN, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY,
                Double.MIN_VALUE, -Double.MAX_VALUE};
        double[] into = new double[2];
        for (DenseKernels kernels : new DenseKernels[] {DenseKernels.best(), DenseKernels.scalar()}) {
            for (int round = 0; round < 3000; round++) {
                int length = random.nextInt(40);
                int from = random.nextInt(4);
                double[] v = new double[from + length + 3];
                for (int t = 0; t < v.length; t++) {
                    v[t] = switch (round % 3) {
                        case 0 -> random.nextGaussian();
                        case 1 -> random.nextBoolean() ? 0.0 : -0.0;
                        default -> random.nextInt(10) == 0 ? specials[random.nextInt(specials.length)]
                                : random.nextGaussian();
                    };
                }
                double lo = Double.POSITIVE_INFINITY;
                double hi = Double.NEGATIVE_INFINITY;
                for (int t = from; t < from + length; t++) {
                    lo = Math.min(lo, v[t]);
                    hi = Math.max(hi, v[t]);
                }
                kernels.minMax(v, from, from + length, into);
                String where = kernels + ", round " + round + ", length " + length;
                assertEquals(Double.doubleToLongBits(lo), Double.doubleToLongBits(into[0]), where + ": min");
                assertEquals(Double.doubleToLongBits(hi), Double.doubleToLongBits(into[1]), where + ": max");
            }
        }
    }
}
