package org.convgrid.engine.batch;

import org.convgrid.engine.convection.StabilityCriterion;

/**
 * The physics choices a grid may vary.
 *
 * @param mixingLength alpha, mixing length in pressure scale heights
 * @param overshoot step overshoot distance, pressure scale heights
 * @param criterion Schwarzschild or Ledoux
 * @param opacityFactor multiplies every opacity (1 = as published)
 */
public record PhysicsOptions(double mixingLength, double overshoot, StabilityCriterion criterion,
                             double opacityFactor) {

    /** Defaults: alpha = 1.8, no overshoot, Schwarzschild, opacity as published. */
    public static final PhysicsOptions DEFAULT = new PhysicsOptions(1.8, 0.0, StabilityCriterion.SCHWARZSCHILD, 1.0);
}
