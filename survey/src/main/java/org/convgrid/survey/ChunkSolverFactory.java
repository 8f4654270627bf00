package org.convgrid.survey;

import org.convgrid.engine.batch.ChunkSolver;
import org.convgrid.engine.batch.ModelSink;
import org.convgrid.engine.batch.StarTrackSink;
import org.convgrid.grids.GridSpec;

/**
 * The seam between the command line and the structure solver: makes the chunk solver that computes a grid's models.
 * Production uses {@link ProductionSolvers#factory()}; tests inject fakes. Called once per run, before anything is
 * written to disk, so a factory that cannot serve a grid leaves no run directory behind.
 */
@FunctionalInterface
public interface ChunkSolverFactory {

    /**
     * @param grid the validated grid (every request the solver will see carries its own physics options)
     * @return a thread-safe solver whose outcome for a chunk depends only on that chunk
     */
    ChunkSolver solverFor(GridSpec grid);

    /**
     * A solver that also hands the evolution track of every star evolved beyond age 0 (with its phases, surface
     * lithium and, from birth, its life events) to {@code tracks}. The
     * default ignores the tracks (fakes that do not evolve).
     *
     * @param grid the validated grid
     * @param tracks thread-safe receiver of the tracks
     */
    default ChunkSolver solverFor(GridSpec grid, StarTrackSink tracks) {
        return solverFor(grid);
    }

    /**
     * A solver that also hands the tracks to {@code tracks} and the model behind every OK row to {@code models} (the
     * grid's {@code output: profiles: true}). The default ignores the models (fakes have none).
     *
     * @param grid the validated grid
     * @param tracks thread-safe receiver of the tracks
     * @param models thread-safe receiver of the models
     */
    default ChunkSolver solverFor(GridSpec grid, StarTrackSink tracks, ModelSink models) {
        return solverFor(grid, tracks);
    }

    /**
     * Starts reading, on a thread of its own, the shared data every solver of this factory reads at its first use
     * (tables shipped with the tool), and returns at once. Called when a run starts, before the grid file is read, so
     * the reading overlaps the reading of the grid and the preparation of the run directory instead of holding up the
     * first chunks: there a worker reads the tables while the other workers, which need them too, wait. Results do
     * not depend on it: the shared data are read once, by whichever thread comes first. The default reads nothing
     * (fakes need nothing).
     */
    default void readSharedDataAhead() {
    }

    /**
     * Whether its solvers hand every star they evolve to the track sink (the production solvers do). A resume then
     * recomputes kept stars whose track files are missing; a fake that writes no tracks would have every star
     * recomputed on every resume. The default: no.
     */
    default boolean writesTracks() {
        return false;
    }
}
