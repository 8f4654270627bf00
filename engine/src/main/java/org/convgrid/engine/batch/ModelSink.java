package org.convgrid.engine.batch;

import org.convgrid.engine.request.ModelRequest;
import org.convgrid.engine.structure.StellarModel;

/**
 * Receives the whole model behind every catalogue row that came out OK (for a profile file of each). Implementations
 * must be thread-safe: chunks are solved in parallel and call it concurrently, once per OK request per chunk solve.
 */
@FunctionalInterface
public interface ModelSink {

    /** Discards every model. */
    ModelSink NONE = (request, model) -> { };

    /**
     * @param request the request the model answers (its id names the model), its age resolved: a main-sequence
     *     fraction arrives as the time it stands for
     * @param model the converged model at the requested age
     */
    void accept(ModelRequest request, StellarModel model);
}
