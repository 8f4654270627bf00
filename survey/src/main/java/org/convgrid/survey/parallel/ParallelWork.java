package org.convgrid.survey.parallel;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.Iterator;
import java.util.List;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ForkJoinPool;
import java.util.function.Function;
import org.convgrid.engine.batch.SharedStep;

/**
 * The one pool of worker threads behind a command: grid runs hand it their chunks, refinement its bisections. Work
 * is handed out in task order and every result comes back in task order, whichever thread computed it and whenever
 * it finished, so what is written never depends on the thread count. Only a bounded window of tasks is in flight
 * ({@link #WINDOW_PER_THREAD} per thread), so a grid of any size runs in bounded memory. Close it when the command
 * ends.
 */
public final class ParallelWork implements AutoCloseable {

    /**
     * Tasks in flight per thread: enough to keep every thread busy while the oldest task finishes. A grid line's first
     * chunk waits for the longest chain of its ladder (the rungs from 1 Msun down to its first mass, one after the
     * other); with 4 per thread the window (some 8 chunks, about one line of 50 masses) had run dry behind it and a
     * worker sat idle until it was done (0.2-0.4 s per run of the 200-model grid at 2 threads, timed per chunk).
     */
    public static final int WINDOW_PER_THREAD = 8;

    /** Receives results in task order, on the calling thread. */
    @FunctionalInterface
    public interface InOrder<R> {
        void accept(R result) throws IOException;
    }

    private final int threads;
    private final ForkJoinPool pool;

    /** @param threads worker threads, &gt;= 1 */
    public ParallelWork(int threads) {
        if (threads < 1) {
            throw new IllegalArgumentException("threads must be >= 1, got " + threads);
        }
        this.threads = threads;
        this.pool = new ForkJoinPool(threads);
    }

    /** Worker threads. */
    public int threads() {
        return threads;
    }

    /**
     * Computes {@code work} of every task (drawn lazily from {@code tasks}) on the pool and hands the results to
     * {@code results} in task order, as soon as every earlier one has been handed over.
     *
     * @throws IOException when {@code results} throws one, or when interrupted while waiting
     * @throws UncheckedIOException wrapping what a task threw
     */
    public <T, R> void forEachInOrder(Iterator<T> tasks, Function<T, R> work, InOrder<R> results)
            throws IOException {
        forEachInOrder(tasks, t -> List.of(), work, results);
    }

    /**
     * As {@link #forEachInOrder(Iterator, Function, InOrder)}, for tasks that share work: {@code groundwork} names
     * the chain of shared steps a task uses, and the task starts only when they are done. A step is done once
     * however many tasks in flight name it, before any task that is ready (the longest chain first), so the threads
     * build the shared work side by side and no thread waits for another; the results are the same as without it.
     */
    public <T, R> void forEachInOrder(Iterator<T> tasks, Function<T, List<SharedStep>> groundwork,
                                      Function<T, R> work, InOrder<R> results) throws IOException {
        GroundworkFirst schedule = new GroundworkFirst(pool);
        Deque<CompletableFuture<R>> window = new ArrayDeque<>();
        int limit = threads * WINDOW_PER_THREAD;
        while (tasks.hasNext() || !window.isEmpty()) {
            while (tasks.hasNext() && window.size() < limit) {
                T task = tasks.next();
                window.add(schedule.add(groundwork.apply(task), () -> work.apply(task)));
            }
            CompletableFuture<R> head = window.poll();
            if (head != null) {
                results.accept(await(head));
            }
        }
    }

    /**
     * Computes {@code work} of every task on the pool; the results in task order.
     *
     * @throws RuntimeException what a task threw, unwrapped (anything else wrapped in an IllegalStateException)
     */
    public <T, R> List<R> mapInOrder(List<T> tasks, Function<T, R> work) throws InterruptedException {
        List<CompletableFuture<R>> running = tasks.stream()
                .map(t -> CompletableFuture.supplyAsync(() -> work.apply(t), pool)).toList();
        List<R> results = new ArrayList<>(running.size());
        for (CompletableFuture<R> f : running) {
            try {
                results.add(f.get());
            } catch (ExecutionException e) {
                throw e.getCause() instanceof RuntimeException r ? r : new IllegalStateException(e.getCause());
            }
        }
        return results;
    }

    private static <R> R await(CompletableFuture<R> result) throws IOException {
        try {
            return result.get();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IOException("interrupted while waiting for models", e);
        } catch (ExecutionException e) {
            throw new UncheckedIOException(new IOException(e.getCause()));
        }
    }

    /** Stops the threads; tasks still running are interrupted. */
    @Override
    public void close() {
        pool.shutdownNow();
    }
}
