package org.convgrid.engine.refine;

import org.convgrid.engine.request.ModelOutcome;
import org.convgrid.engine.request.ModelRequest;

/**
 * Models of one line of constant composition and physics, computed one at a time in the order asked. A line may
 * seed each model from the models it has already converged, so an answer depends on the requests before it (and
 * on nothing else: no timing, no other line). Not thread-safe: one line per task.
 */
@FunctionalInterface
public interface MassLine {

    /**
     * @param request a model of this line (its composition and physics are the line's)
     * @return the outcome; a model that fails is an outcome with its status, never an exception
     */
    ModelOutcome solve(ModelRequest request);
}
