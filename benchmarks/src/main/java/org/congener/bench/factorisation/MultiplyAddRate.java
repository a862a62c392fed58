package org.congener.bench.factorisation;

import java.util.ArrayList;
import java.util.List;
import org.congener.core.factorisation.DenseKernels;

/**
 * This machine's multiply-add rate for a kernel: threads each run length-64 dot products over a
 * cache-resident 64 × 64 block (the shape of the solvers' inner loops). {@link #best} warms the JIT
 * first (the Vector API runs a slow fallback until C2 has compiled the kernel) and keeps the best of
 * several runs, since the machine is shared.
 */
public final class MultiplyAddRate {
    private MultiplyAddRate() {
    }

    public static void main(String[] args) throws InterruptedException {
        int threads = args.length > 0 ? Integer.parseInt(args[0]) : 2;
        for (DenseKernels k : new DenseKernels[] {DenseKernels.scalar(), DenseKernels.best()}) {
            System.out.printf(java.util.Locale.ROOT, "%s on %d threads: %.2f G multiply-adds/s (best of 7)%n", k,
                    threads, best(k, threads, 7) / 1e9);
        }
    }

    /** The best of {@code runs} measurements after a warm-up, in multiply-adds per second. */
    public static double best(DenseKernels kernels, int threads, int runs) throws InterruptedException {
        for (int w = 0; w < 3; w++) {
            measure(kernels, 1);
        }
        double best = 0;
        for (int r = 0; r < runs; r++) {
            best = Math.max(best, measure(kernels, threads));
        }
        return best;
    }

    static double measure(DenseKernels kernels, int threads) throws InterruptedException {
        final int k = 64;
        final long repeats = 40_000;
        double[] sink = new double[threads];
        List<Thread> workers = new ArrayList<>();
        run(kernels, k, 2_000, sink, 0); // warm-up
        long t0 = System.nanoTime();
        for (int t = 0; t < threads; t++) {
            final int id = t;
            Thread w = new Thread(() -> run(kernels, k, repeats, sink, id));
            workers.add(w);
            w.start();
        }
        for (Thread w : workers) {
            w.join();
        }
        double seconds = (System.nanoTime() - t0) / 1e9;
        double checksum = 0;
        for (double s : sink) {
            checksum += s;
        }
        if (Double.isNaN(checksum)) {
            throw new IllegalStateException("NaN");
        }
        return threads * repeats * k * (double) k / seconds;
    }

    private static void run(DenseKernels kernels, int k, long repeats, double[] sink, int id) {
        double[] a = new double[k * k];
        double[] x = new double[k];
        for (int t = 0; t < a.length; t++) {
            a[t] = 1e-3 * (t % 17);
        }
        for (int t = 0; t < k; t++) {
            x[t] = 1e-3 * t;
        }
        double s = 0;
        for (long r = 0; r < repeats; r++) {
            for (int row = 0; row < k; row++) {
                s += kernels.dot(a, row * k, x, 0, k);
            }
            x[(int) (r % k)] = s * 1e-12;
        }
        sink[id] = s;
    }
}
