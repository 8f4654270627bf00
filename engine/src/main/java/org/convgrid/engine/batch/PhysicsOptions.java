package org.convgrid.engine.batch;

import org.convgrid.engine.convection.StabilityCriterion;

/**
 * The physics choices a grid may vary.
 *
 * @param mixingLength alpha, mixing length in pressure scale heights
 * @param overshoot step overshoot distance, pressure scale heights
 * @param criterion Schwarzschild or Ledoux
 * @param opacityFactor multiplies every opacity (1 = as published)
 * @param opacityTable path of a user opacity table in convgrid's table layout; empty for the analytic opacity
 */
public record PhysicsOptions(double mixingLength, double overshoot, StabilityCriterion criterion,
                             double opacityFactor, String opacityTable) {

    public PhysicsOptions {
        if (opacityTable == null) {
            throw new IllegalArgumentException("opacityTable must not be null; use \"\" for none");
        }
    }

    /** Options with the analytic opacity. */
    public PhysicsOptions(double mixingLength, double overshoot, StabilityCriterion criterion, double opacityFactor) {
        this(mixingLength, overshoot, criterion, opacityFactor, "");
    }

    /** Whether a user opacity table replaces the analytic opacity. */
    public boolean usesOpacityTable() {
        return !opacityTable.isEmpty();
    }

    /** Defaults: alpha = 1.8, no overshoot, Schwarzschild, opacity as published. */
    public static final PhysicsOptions DEFAULT = new PhysicsOptions(1.8, 0.0, StabilityCriterion.SCHWARZSCHILD, 1.0);
}
