package org.convgrid.engine.batch;

import org.convgrid.engine.convection.StabilityCriterion;
import org.convgrid.engine.physics.OvershootScheme;
import org.convgrid.engine.physics.atmosphere.AtmosphereChoice;

/**
 * The physics choices a grid may vary.
 *
 * @param mixingLength alpha, mixing length in pressure scale heights
 * @param overshoot overshoot parameter: alpha_ov (pressure scale heights) for the step scheme, f for the
 *                  exponential one
 * @param criterion Schwarzschild or Ledoux
 * @param opacityFactor multiplies every opacity (1 = as published)
 * @param opacityTable path of a user opacity table in convgrid's table layout; empty for the built-in opacity
 * @param atmosphere the grey T(tau) relation of the surface boundary
 * @param overshootScheme step (default) or exponential overshoot
 */
public record PhysicsOptions(double mixingLength, double overshoot, StabilityCriterion criterion,
                             double opacityFactor, String opacityTable, AtmosphereChoice atmosphere,
                             OvershootScheme overshootScheme) {

    public PhysicsOptions {
        if (opacityTable == null) {
            throw new IllegalArgumentException("opacityTable must not be null; use \"\" for none");
        }
        if (atmosphere == null) {
            throw new IllegalArgumentException("atmosphere must not be null");
        }
        if (overshootScheme == null) {
            throw new IllegalArgumentException("overshootScheme must not be null");
        }
    }

    /** Options with step overshoot. */
    public PhysicsOptions(double mixingLength, double overshoot, StabilityCriterion criterion, double opacityFactor,
                          String opacityTable, AtmosphereChoice atmosphere) {
        this(mixingLength, overshoot, criterion, opacityFactor, opacityTable, atmosphere, OvershootScheme.STEP);
    }

    /** Options with the default atmosphere ({@link AtmosphereChoice#DEFAULT}). */
    public PhysicsOptions(double mixingLength, double overshoot, StabilityCriterion criterion, double opacityFactor,
                          String opacityTable) {
        this(mixingLength, overshoot, criterion, opacityFactor, opacityTable, AtmosphereChoice.DEFAULT);
    }

    /** Options with the built-in opacity and the default atmosphere. */
    public PhysicsOptions(double mixingLength, double overshoot, StabilityCriterion criterion, double opacityFactor) {
        this(mixingLength, overshoot, criterion, opacityFactor, "");
    }

    /** Whether a user opacity table replaces the built-in opacity. */
    public boolean usesOpacityTable() {
        return !opacityTable.isEmpty();
    }

    /** The same options with another atmosphere. */
    public PhysicsOptions withAtmosphere(AtmosphereChoice choice) {
        return new PhysicsOptions(mixingLength, overshoot, criterion, opacityFactor, opacityTable, choice,
                overshootScheme);
    }

    /** The same options with another overshoot scheme. */
    public PhysicsOptions withOvershootScheme(OvershootScheme scheme) {
        return new PhysicsOptions(mixingLength, overshoot, criterion, opacityFactor, opacityTable, atmosphere,
                scheme);
    }

    /** Defaults: alpha = 1.8, no overshoot (step scheme), Schwarzschild, opacity as built in, the default
     * atmosphere. */
    public static final PhysicsOptions DEFAULT = new PhysicsOptions(1.8, 0.0, StabilityCriterion.SCHWARZSCHILD, 1.0);
}
