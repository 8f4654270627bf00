package org.convgrid.engine.batch;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.EnumMap;
import java.util.Iterator;
import java.util.List;
import java.util.Map;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ForkJoinPool;
import java.util.function.Predicate;
import org.convgrid.engine.request.ModelOutcome;
import org.convgrid.engine.request.ModelRequest;
import org.convgrid.engine.request.ModelStatus;

/**
 * Sweeps a grid on a ForkJoin pool and hands the outcomes to a sink in grid order, as soon as the prefix is
 * complete. Only a bounded window of chunks is in flight, so a grid of any size runs in bounded memory.
 *
 * <p>Chunks are cut from the grid alone ({@link Chunking}); a chunk of which some rows are already done (a
 * resumed run) is recomputed from its own seed and only its missing rows are emitted, so the catalogue is
 * byte-identical whatever the thread count, the sharding or the interruptions.
 */
public final class ModelScheduler {

    /** Chunks in flight per thread: enough to keep every thread busy while the head chunk finishes. */
    public static final int WINDOW_PER_THREAD = 4;

    private final int threads;
    private final int massesPerChunk;

    public ModelScheduler(int threads, int massesPerChunk) {
        if (threads < 1) {
            throw new IllegalArgumentException("threads must be >= 1, got " + threads);
        }
        this.threads = threads;
        this.massesPerChunk = massesPerChunk;
    }

    /**
     * @param requests every request of the grid, in grid order (lazily produced is fine)
     * @param shard which share of the chunks to compute
     * @param alreadyDone requests whose rows already exist and must not be emitted again
     * @param solver computes one chunk
     * @param sink receives the new outcomes in grid order
     * @param progress told after each emitted outcome
     * @param expectedTotal how many outcomes this run will emit, for progress (-1 if unknown)
     * @return counts of the emitted outcomes by status
     */
    public Map<ModelStatus, Long> run(Iterator<ModelRequest> requests, Shard shard,
                                      Predicate<ModelRequest> alreadyDone, ChunkSolver solver, OutcomeSink sink,
                                      ProgressListener progress, long expectedTotal) throws IOException {
        Map<ModelStatus, Long> counts = new EnumMap<>(ModelStatus.class);
        ForkJoinPool pool = new ForkJoinPool(threads);
        try {
            Deque<Pending> window = new ArrayDeque<>();
            Chunking chunks = new Chunking(requests, massesPerChunk);
            long position = 0;
            long emitted = 0;
            while (chunks.hasNext() || !window.isEmpty()) {
                while (chunks.hasNext() && window.size() < threads * WINDOW_PER_THREAD) {
                    List<ModelRequest> chunk = chunks.next();
                    boolean mine = shard.owns(position++);
                    if (mine && !chunk.stream().allMatch(alreadyDone)) {
                        window.add(new Pending(chunk,
                                CompletableFuture.supplyAsync(() -> solveSafely(solver, chunk), pool)));
                    }
                }
                if (window.isEmpty()) {
                    continue;
                }
                Pending head = window.poll();
                for (ModelOutcome outcome : head.await()) {
                    if (!alreadyDone.test(outcome.request())) {
                        sink.accept(outcome);
                        counts.merge(outcome.status(), 1L, Long::sum);
                        progress.progress(++emitted, expectedTotal);
                    }
                }
            }
        } finally {
            pool.shutdownNow();
        }
        return counts;
    }

    /** A chunk solver that throws still yields one failed row per request: the run goes on. */
    static List<ModelOutcome> solveSafely(ChunkSolver solver, List<ModelRequest> chunk) {
        try {
            List<ModelOutcome> outcomes = solver.solve(chunk);
            if (outcomes.size() != chunk.size()) {
                throw new IllegalStateException("chunk solver returned " + outcomes.size() + " outcomes for "
                        + chunk.size() + " requests");
            }
            return outcomes;
        } catch (RuntimeException e) {
            List<ModelOutcome> failed = new ArrayList<>(chunk.size());
            // the catalogue's status_detail is read by people: our own failures carry a worded message, anything
            // else is a fault of the solver, said so without a Java class name
            String reason = e instanceof org.convgrid.engine.error.ConvgridException ? e.getMessage()
                    : "internal error in the solver; the models of this chunk were not computed";
            for (ModelRequest r : chunk) {
                failed.add(new ModelOutcome.Failed(r, ModelStatus.FAILED, reason, 0));
            }
            return failed;
        }
    }

    private record Pending(List<ModelRequest> chunk, CompletableFuture<List<ModelOutcome>> result) {
        List<ModelOutcome> await() throws IOException {
            try {
                return result.get();
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                throw new IOException("interrupted while waiting for models", e);
            } catch (ExecutionException e) {
                throw new UncheckedIOException(new IOException(e.getCause()));
            }
        }
    }
}
