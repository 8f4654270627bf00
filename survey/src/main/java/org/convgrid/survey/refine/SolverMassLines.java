package org.convgrid.survey.refine;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.convgrid.engine.batch.ChunkSolver;
import org.convgrid.engine.batch.StarTrackSink;
import org.convgrid.engine.refine.MassLine;
import org.convgrid.engine.refine.MassLineFactory;
import org.convgrid.engine.refine.ZamsMassLines;
import org.convgrid.engine.request.ModelOutcome;
import org.convgrid.engine.request.ModelRequest;
import org.convgrid.engine.request.PhysicsOptions;
import org.convgrid.survey.ProductionSolvers;

/**
 * Refinement lines that answer a request at any age: a zero-age request on the seeded zero-age line (each model seeded
 * by homology from its converged neighbours), any other age by the grid's own chunk solver, one mass as a chunk of its
 * own, so a new model is evolved exactly as a grid model of the same request would be, whatever the age's origin (the
 * request's {@link org.convgrid.engine.request.Age} says it). A line remembers the evolved answers it gave, so two
 * searches that share a line do not evolve one mass twice. Thread-safe factory; each line is for one task.
 */
public final class SolverMassLines implements MassLineFactory {

    private final MassLineFactory zeroAge;
    private final ChunkSolver evolved;

    /**
     * @param zeroAge the lines of zero-age requests
     * @param evolved the thread-safe solver of requests at other ages (its track sink, if any, is its own)
     */
    public SolverMassLines(MassLineFactory zeroAge, ChunkSolver evolved) {
        this.zeroAge = zeroAge;
        this.evolved = evolved;
    }

    /** The production lines: {@link ZamsMassLines} and the production chunk solver, writing no track files. */
    public static SolverMassLines production() {
        return new SolverMassLines(new ZamsMassLines(), ProductionSolvers.solver(StarTrackSink.NONE));
    }

    @Override
    public MassLine open(PhysicsOptions physics, double initialMetals, double initialHelium) {
        MassLine zero = zeroAge.open(physics, initialMetals, initialHelium);
        Map<ModelRequest, ModelOutcome> answered = new HashMap<>();
        return request -> request.age().isZeroAge() ? zero.solve(request)
                : answered.computeIfAbsent(request, r -> evolved.solve(List.of(r)).get(0));
    }
}
