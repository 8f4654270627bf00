package org.convgrid.engine.evolution;

import org.convgrid.engine.structure.StellarModel;

/**
 * Receives every accepted model of one evolution, the start model first (age 0, step 0), in increasing age. Called
 * on the evolving thread; an observer belongs to one evolution and need not be thread-safe.
 */
@FunctionalInterface
public interface StepObserver {

    /** Ignores every model. */
    StepObserver NONE = (age, timeStep, model) -> { };

    /**
     * @param age s since the start model
     * @param timeStep the step that led here, s (0 for the start model)
     * @param model the converged model
     */
    void accepted(double age, double timeStep, StellarModel model);
}
