package org.convgrid.grids;

import org.convgrid.engine.request.ModelRequest;

/** A guess of how long one model takes, for run-time estimates (for example from a previous run's median). */
@FunctionalInterface
public interface ModelCost {

    /** Seconds the model takes on one thread. */
    double seconds(ModelRequest request);

    /** The same cost for every model. */
    static ModelCost constant(double seconds) {
        return request -> seconds;
    }
}
