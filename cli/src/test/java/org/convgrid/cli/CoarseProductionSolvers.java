package org.convgrid.cli;

import org.convgrid.engine.batch.ChunkSolver;
import org.convgrid.engine.batch.GridRequests;
import org.convgrid.engine.batch.StarTrackSink;
import org.convgrid.engine.evolution.MainSequenceEvolver;
import org.convgrid.grids.GridSpec;
import org.convgrid.survey.ChunkSolverFactory;

/**
 * The production engine with every evolution time step three times longer: real models, evolved fast enough for
 * command-line tests of runs that evolve stars (from birth or from the zero-age main sequence).
 */
final class CoarseProductionSolvers {

    static final ChunkSolverFactory FACTORY = new ChunkSolverFactory() {
        @Override
        public ChunkSolver solverFor(GridSpec grid) {
            return solverFor(grid, StarTrackSink.NONE);
        }

        @Override
        public ChunkSolver solverFor(GridSpec grid, StarTrackSink tracks) {
            return new GridRequests(tracks, MainSequenceEvolver.Settings.DEFAULT.scaled(3.0));
        }

        @Override
        public boolean writesTracks() {
            return true;
        }
    };

    private CoarseProductionSolvers() {
    }
}
