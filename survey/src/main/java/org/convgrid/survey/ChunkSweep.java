package org.convgrid.survey;

import java.io.IOException;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.Iterator;
import java.util.List;
import java.util.Map;
import java.util.NoSuchElementException;
import java.util.concurrent.atomic.AtomicLong;
import java.util.function.Predicate;
import org.convgrid.engine.batch.ChunkSolver;
import org.convgrid.engine.batch.Chunking;
import org.convgrid.engine.request.ModelOutcome;
import org.convgrid.engine.request.ModelRequest;
import org.convgrid.engine.request.ModelStatus;
import org.convgrid.engine.batch.OutcomeSink;
import org.convgrid.engine.batch.ProgressListener;
import org.convgrid.engine.batch.Shard;
import org.convgrid.engine.batch.SharedStep;
import org.convgrid.survey.parallel.ParallelWork;

/**
 * Sweeps a shard's chunks of a grid on the command's {@link ParallelWork} and hands the outcomes to a sink in grid
 * order. The work chunks share (a line's zero-age ladder, {@link ChunkSolver#groundwork}) is built ahead as steps of
 * its own, so a thread never waits for the rungs another is building. Chunks are cut from the grid alone
 * ({@link Chunking}); a chunk of which some rows are already done (a resumed run) is recomputed from its own seed and
 * only its missing rows are emitted, so the catalogue is byte-identical whatever the thread count, the sharding or
 * the interruptions.
 */
final class ChunkSweep {

    private ChunkSweep() {
    }

    /**
     * @param requests every request of the grid, in grid order (lazily produced is fine)
     * @param massesPerChunk the chunk length
     * @param shard which share of the chunks to compute
     * @param alreadyDone requests whose rows already exist and must not be emitted again
     * @param solver computes one chunk
     * @param sink receives the new outcomes in grid order
     * @param progress told once per chunk, after its outcomes are emitted (a chunk's models arrive together: told
     *                 one by one, the first of a chunk that took a minute would be timed as one model per minute),
     *                 with the models computed so far and those emitted
     * @param expectedTotal how many outcomes this run will emit, for progress (-1 if unknown)
     * @return counts of the emitted outcomes by status
     */
    static Map<ModelStatus, Long> run(ParallelWork work, Iterator<ModelRequest> requests, int massesPerChunk,
                                      Shard shard, Predicate<ModelRequest> alreadyDone, ChunkSolver solver,
                                      OutcomeSink sink, ProgressListener progress, long expectedTotal)
            throws IOException {
        Map<ModelStatus, Long> counts = new EnumMap<>(ModelStatus.class);
        long[] emitted = {0};
        // counted on the worker threads as chunks end, in whatever order: the progress line tells them apart from
        // the rows written, which is what an interrupt keeps
        AtomicLong computed = new AtomicLong();
        work.forEachInOrder(owned(new Chunking(requests, massesPerChunk), shard, alreadyDone),
                chunk -> groundworkSafely(solver, chunk), chunk -> {
                    List<ModelOutcome> outcomes = solveSafely(solver, chunk);
                    computed.addAndGet(chunk.stream().filter(r -> !alreadyDone.test(r)).count());
                    return outcomes;
                }, outcomes -> {
                    long before = emitted[0];
                    for (ModelOutcome outcome : outcomes) {
                        if (!alreadyDone.test(outcome.request())) {
                            sink.accept(outcome);
                            counts.merge(outcome.status(), 1L, Long::sum);
                            emitted[0]++;
                        }
                    }
                    if (emitted[0] > before) {
                        progress.progress(Math.max(computed.get(), emitted[0]), emitted[0], expectedTotal);
                    }
                });
        return counts;
    }

    /** The chunks the shard owns that still miss a row, in grid order, cut lazily. */
    private static Iterator<List<ModelRequest>> owned(Chunking chunks, Shard shard, Predicate<ModelRequest> done) {
        return new Iterator<>() {
            private long position;
            private List<ModelRequest> next;

            @Override
            public boolean hasNext() {
                while (next == null && chunks.hasNext()) {
                    List<ModelRequest> chunk = chunks.next();
                    if (shard.owns(position++) && !chunk.stream().allMatch(done)) {
                        next = chunk;
                    }
                }
                return next != null;
            }

            @Override
            public List<ModelRequest> next() {
                if (!hasNext()) {
                    throw new NoSuchElementException();
                }
                List<ModelRequest> chunk = next;
                next = null;
                return chunk;
            }
        };
    }

    /** A chunk's shared steps; none when the solver cannot name them (the chunk then builds what it needs). */
    private static List<SharedStep> groundworkSafely(ChunkSolver solver, List<ModelRequest> chunk) {
        try {
            return solver.groundwork(chunk);
        } catch (RuntimeException e) {
            return List.of();
        }
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
                failed.add(new ModelOutcome.Failed(r, ModelStatus.FAILED, reason, ModelOutcome.NO_MODEL_SOLVED));
            }
            return failed;
        }
    }
}
