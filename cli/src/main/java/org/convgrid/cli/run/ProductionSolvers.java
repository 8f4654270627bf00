package org.convgrid.cli.run;

import org.convgrid.engine.zams.ZeroAgeRequests;

/** Where the production structure solver is plugged into the command line. */
public final class ProductionSolvers {

    private ProductionSolvers() {
    }

    /** The chunk solver factory {@code convgrid run} uses outside tests: zero-age models seeded by homology. */
    public static ChunkSolverFactory factory() {
        return grid -> new ZeroAgeRequests();
    }
}
