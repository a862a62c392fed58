package org.congener.bench.factorisation;

import java.util.Locale;
import java.util.SplittableRandom;

import org.congener.core.factorisation.DenseKernels;
import org.congener.core.factorisation.FactorColumns;
import org.congener.core.factorisation.FactorMatrix;

/**
 * The CF product Y·x of one event with the factor matrix in cache (as a benchmark that repeats it
 * sees it) and evicted first (as the stream thread sees it, after the broker, RocksDB and the Kafka
 * clients ran between two events): the row-major product over Y held as doubles
 * ({@link DenseKernels#multiply}), and the factor-major product over Y held as floats that the
 * scoring runs ({@link FactorColumns}). Eviction: a pass over a buffer far larger than the last-level
 * cache between two products; the pass is not timed.
 *
 * <p>Then the factor-major product of a batch of B researchers' vectors with one pass over the floats,
 * as the stream scores a batch of events ({@link FactorColumns#multiplyMany}), reported per vector.
 *
 * <p>Arguments: items rank repetitions evictionMegabytes batch.
 */
public final class ColdCacheProduct {

    private ColdCacheProduct() {
    }

    public static void main(String[] args) {
        int items = args.length > 0 ? Integer.parseInt(args[0]) : 10_000;
        int rank = args.length > 1 ? Integer.parseInt(args[1]) : 64;
        int repetitions = args.length > 2 ? Integer.parseInt(args[2]) : 200;
        int evictMb = args.length > 3 ? Integer.parseInt(args[3]) : 256;
        int batch = args.length > 4 ? Integer.parseInt(args[4]) : 8;
        SplittableRandom random = new SplittableRandom(7);
        float[] narrow = new float[items * rank];
        double[] wide = new double[items * rank];
        for (int t = 0; t < wide.length; t++) {
            narrow[t] = (float) random.nextGaussian();
            wide[t] = narrow[t];
        }
        double[] x = random.doubles(rank, -1, 1).toArray();
        double[] out = new double[items];
        double[][] xs = new double[batch][];
        for (int b = 0; b < batch; b++) {
            xs[b] = random.doubles(rank, -1, 1).toArray();
        }
        double[][] outs = new double[batch][items];
        FactorColumns columns = FactorColumns.of(new FactorMatrix(items, rank, wide));
        if (!columns.floats()) {
            throw new IllegalStateException("factors drawn as floats are held as doubles");
        }
        long[] evict = new long[evictMb * 131_072];
        DenseKernels kernels = DenseKernels.best();
        System.out.printf(Locale.ROOT, "%d items, rank %d, %s; %d products each, eviction buffer %d MB%n", items, rank,
                kernels, repetitions, evictMb);
        for (int round = 0; round < 2; round++) {
            // round 0 warms the JIT; round 1 is reported
            double[] hotWide = time(repetitions, () -> kernels.multiply(wide, 0, items, rank, x, 0, out, 0), null);
            double[] hotNarrow = time(repetitions, () -> columns.multiply(kernels, x, out), null);
            double[] coldWide = time(repetitions, () -> kernels.multiply(wide, 0, items, rank, x, 0, out, 0), evict);
            double[] coldNarrow = time(repetitions, () -> columns.multiply(kernels, x, out), evict);
            double[] hotBatch = time(repetitions, () -> columns.multiplyMany(kernels, xs, batch, outs), null);
            double[] coldBatch = time(repetitions, () -> columns.multiplyMany(kernels, xs, batch, outs), evict);
            if (round == 1) {
                long floatBytes = (long) columns.paddedItems() * rank * 4;
                report("doubles, row-major,    in cache", hotWide, wide.length * 8L);
                report("floats,  factor-major, in cache", hotNarrow, floatBytes);
                report("doubles, row-major,    evicted ", coldWide, wide.length * 8L);
                report("floats,  factor-major, evicted ", coldNarrow, floatBytes);
                reportPerVector("floats,  factor-major, batch of " + batch + ", in cache", hotBatch, batch);
                reportPerVector("floats,  factor-major, batch of " + batch + ", evicted ", coldBatch, batch);
            }
        }
        System.out.println(out[items / 2] == 12345.0 ? "" : "");
    }

    /** Microseconds of each product, sorted; {@code evict} non-null: a pass over it before each product. */
    private static double[] time(int repetitions, Runnable product, long[] evict) {
        double[] micros = new double[repetitions];
        long sink = 0;
        for (int r = 0; r < repetitions; r++) {
            if (evict != null) {
                for (int t = 0; t < evict.length; t += 8) {
                    evict[t] += t;
                    sink += evict[t];
                }
            }
            long t0 = System.nanoTime();
            product.run();
            micros[r] = (System.nanoTime() - t0) / 1e3;
        }
        if (sink == 42) {
            System.out.print("");
        }
        java.util.Arrays.sort(micros);
        return micros;
    }

    private static void reportPerVector(String what, double[] micros, int batch) {
        System.out.printf(Locale.ROOT, "%s: median %.0f µs per vector (min %.0f, p90 %.0f)%n", what,
                micros[micros.length / 2] / batch, micros[0] / batch, micros[(int) (micros.length * 0.9)] / batch);
    }

    private static void report(String what, double[] micros, long bytes) {
        double median = micros[micros.length / 2];
        System.out.printf(Locale.ROOT, "%s: median %.0f µs (min %.0f, p90 %.0f), %.1f GB/s of factors%n", what,
                median, micros[0], micros[(int) (micros.length * 0.9)], bytes / median / 1e3);
    }
}
