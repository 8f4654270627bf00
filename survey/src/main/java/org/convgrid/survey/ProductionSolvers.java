package org.convgrid.survey;

import org.convgrid.engine.batch.ChunkSolver;
import org.convgrid.engine.batch.GridRequests;
import org.convgrid.engine.evolution.MainSequenceEvolver;
import org.convgrid.engine.batch.ModelSink;
import org.convgrid.engine.batch.StarTrackSink;
import org.convgrid.grids.GridSpec;

/** Where the production structure solver is plugged into the command line. */
public final class ProductionSolvers {

    private ProductionSolvers() {
    }

    /**
     * The chunk solver factory {@code convgrid run} uses outside tests: zero-age models seeded by homology, evolved
     * in age with the main-sequence evolver when the grid asks for ages above 0, or stars evolved from birth (each
     * request's age says how it is counted: time since birth or since the zero-age main sequence, or a fraction of the
     * star's main-sequence lifetime).
     */
    public static ChunkSolverFactory factory() {
        return new ChunkSolverFactory() {
            @Override
            public ChunkSolver solverFor(GridSpec grid) {
                return solver(StarTrackSink.NONE);
            }

            @Override
            public ChunkSolver solverFor(GridSpec grid, StarTrackSink tracks) {
                return solver(tracks);
            }

            @Override
            public ChunkSolver solverFor(GridSpec grid, StarTrackSink tracks, ModelSink models) {
                return new GridRequests(tracks, models, MainSequenceEvolver.Settings.DEFAULT);
            }

            @Override
            public boolean writesTracks() {
                return true;
            }

            @Override
            public void readSharedDataAhead() {
                ShippedTablesReadAhead.start();
            }
        };
    }

    /**
     * The production chunk solver, whatever the grid: the one place grid runs and the refinement of transitions at
     * ages above 0 take it from, so a new model is computed as a grid model would be.
     *
     * @param tracks receives the track (and life events) of every star evolved beyond age 0
     */
    public static ChunkSolver solver(StarTrackSink tracks) {
        return new GridRequests(tracks, MainSequenceEvolver.Settings.DEFAULT);
    }
}
