package org.congener.core.factorisation;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.function.IntConsumer;
import java.util.function.Supplier;

/**
 * Runs work over row ranges on a fixed number of threads. Each row is computed from read-only inputs
 * into its own output slot, so results do not depend on which thread takes which range.
 */
public final class ParallelRows implements AutoCloseable {
    private final int threads;
    private final ExecutorService pool;

    public ParallelRows(int threads) {
        if (threads < 1) {
            throw new IllegalArgumentException("threads must be >= 1: " + threads);
        }
        this.threads = threads;
        this.pool = threads == 1 ? null : Executors.newFixedThreadPool(threads, r -> {
            Thread t = new Thread(r, "congener-factorisation");
            t.setDaemon(true);
            return t;
        });
    }

    public int threads() {
        return threads;
    }

    /** Calls {@code body.accept(row, state)} for every row, with one state object per thread. */
    public <S> void forEachRow(int rows, Supplier<S> stateFactory, RowBody<S> body) {
        int chunk = Math.max(16, rows / (threads * 32));
        AtomicInteger next = new AtomicInteger();
        runOnAll(() -> {
            S state = stateFactory.get();
            int from;
            while ((from = next.getAndAdd(chunk)) < rows) {
                int to = Math.min(rows, from + chunk);
                for (int r = from; r < to; r++) {
                    body.accept(r, state);
                }
            }
        });
    }

    /** Calls {@code body.accept(block)} for block = 0 .. blocks−1, spread over the threads. */
    public void forEachBlock(int blocks, IntConsumer body) {
        AtomicInteger next = new AtomicInteger();
        runOnAll(() -> {
            int b;
            while ((b = next.getAndIncrement()) < blocks) {
                body.accept(b);
            }
        });
    }

    private void runOnAll(Runnable task) {
        if (pool == null) {
            task.run();
            return;
        }
        List<Future<?>> futures = new ArrayList<>(threads);
        for (int t = 0; t < threads; t++) {
            futures.add(pool.submit(task));
        }
        for (Future<?> f : futures) {
            try {
                f.get();
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                throw new IllegalStateException("interrupted", e);
            } catch (ExecutionException e) {
                Throwable cause = e.getCause();
                if (cause instanceof RuntimeException re) {
                    throw re;
                }
                if (cause instanceof Error err) {
                    throw err;
                }
                throw new IllegalStateException(cause);
            }
        }
    }

    @Override
    public void close() {
        if (pool != null) {
            pool.shutdownNow();
        }
    }

    /** Work on one row with a per-thread state. */
    @FunctionalInterface
    public interface RowBody<S> {
        void accept(int row, S state);
    }
}
