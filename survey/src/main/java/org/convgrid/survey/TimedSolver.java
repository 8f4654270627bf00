package org.convgrid.survey;

import java.util.List;
import java.util.concurrent.ConcurrentLinkedQueue;
import java.util.stream.DoubleStream;
import org.convgrid.engine.batch.ChunkSolver;
import org.convgrid.engine.batch.SharedStep;
import org.convgrid.engine.request.ModelOutcome;
import org.convgrid.engine.request.ModelRequest;
import org.convgrid.output.manifest.RunManifest;

/**
 * Measures a chunk solver: each chunk's wall time divided by its models is recorded once per model, so the median
 * is the per-model cost of the typical model (chunks seeded by homology share their cost evenly). Thread-safe.
 */
final class TimedSolver implements ChunkSolver {

    private final ChunkSolver solver;
    private final ConcurrentLinkedQueue<double[]> chunks = new ConcurrentLinkedQueue<>();

    TimedSolver(ChunkSolver solver) {
        this.solver = solver;
    }

    @Override
    public List<ModelOutcome> solve(List<ModelRequest> chunk) {
        long start = System.nanoTime();
        try {
            return solver.solve(chunk);
        } finally {
            double perModel = (System.nanoTime() - start) * 1e-9 / Math.max(1, chunk.size());
            chunks.add(new double[] {perModel, chunk.size()});
        }
    }

    /** The wrapped solver's groundwork, untimed (it is shared by chunks, not theirs). */
    @Override
    public List<SharedStep> groundwork(List<ModelRequest> chunk) {
        return solver.groundwork(chunk);
    }

    /** Median seconds per model over every chunk solved so far; NaN when none. */
    double medianSecondsPerModel() {
        double[] all = chunks.stream()
                .flatMapToDouble(c -> DoubleStream.generate(() -> c[0]).limit((long) c[1])).toArray();
        return RunManifest.median(all);
    }
}
