package org.congener.bench.factorisation;

import jdk.incubator.vector.DoubleVector;
import jdk.incubator.vector.VectorSpecies;

/**
 * The most double-precision multiply-adds one core does per second here: eight independent chains of
 * vector fused multiply-adds on registers, no memory traffic, no reduction until the end. It is the
 * yardstick of the end-to-end benchmark's ideal rate (a compute bound no real kernel reaches; the
 * length-64 dot products of {@link MultiplyAddRate} pay a horizontal reduction every 8 lanes).
 */
public final class PeakMultiplyAddRate {

    private static final VectorSpecies<Double> SPECIES = DoubleVector.SPECIES_PREFERRED;

    private PeakMultiplyAddRate() {
    }

    public static void main(String[] args) {
        System.out.printf(java.util.Locale.ROOT, "%d-lane double FMA chains, one thread: %.2f G multiply-adds/s (best of 7)%n",
                SPECIES.length(), best(7) / 1e9);
    }

    /** Best of {@code runs} after a warm-up long enough for C2 to compile the vector loop. */
    public static double best(int runs) {
        for (int w = 0; w < 5; w++) {
            measure(2_000_000);
        }
        double best = 0;
        for (int r = 0; r < runs; r++) {
            best = Math.max(best, measure(20_000_000));
        }
        return best;
    }

    static double measure(long steps) {
        DoubleVector a = DoubleVector.broadcast(SPECIES, 0.999_999);
        DoubleVector b = DoubleVector.broadcast(SPECIES, 1e-9);
        DoubleVector s0 = DoubleVector.broadcast(SPECIES, 1);
        DoubleVector s1 = s0;
        DoubleVector s2 = s0;
        DoubleVector s3 = s0;
        DoubleVector s4 = s0;
        DoubleVector s5 = s0;
        DoubleVector s6 = s0;
        DoubleVector s7 = s0;
        long t0 = System.nanoTime();
        for (long i = 0; i < steps; i++) {
            s0 = s0.fma(a, b);
            s1 = s1.fma(a, b);
            s2 = s2.fma(a, b);
            s3 = s3.fma(a, b);
            s4 = s4.fma(a, b);
            s5 = s5.fma(a, b);
            s6 = s6.fma(a, b);
            s7 = s7.fma(a, b);
        }
        double seconds = (System.nanoTime() - t0) / 1e9;
        double sum = s0.add(s1).add(s2).add(s3).add(s4).add(s5).add(s6).add(s7).reduceLanes(jdk.incubator.vector.VectorOperators.ADD);
        if (Double.isNaN(sum)) {
            throw new IllegalStateException("NaN");
        }
        return steps * 8.0 * SPECIES.length() / seconds;
    }
}
