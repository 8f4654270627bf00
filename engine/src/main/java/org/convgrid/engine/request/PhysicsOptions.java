package org.convgrid.engine.request;

import org.convgrid.engine.convection.StabilityCriterion;
import org.convgrid.engine.overshoot.Overshoot;
import org.convgrid.engine.physics.atmosphere.AtmosphereChoice;

/**
 * The physics choices a grid may vary.
 *
 * @param mixingLength alpha, mixing length in pressure scale heights
 * @param overshoot overshoot parameter: alpha_ov (pressure scale heights) for the step scheme, f for the
 *                  exponential one
 * @param criterion Schwarzschild or Ledoux
 * @param opacityScale multiplies every opacity (1 = as published)
 * @param opacity the built-in opacity or a user table, before the factor
 * @param atmosphere the grey T(tau) relation of the surface boundary
 * @param overshootScheme step (default) or exponential overshoot
 */
public record PhysicsOptions(double mixingLength, double overshoot, StabilityCriterion criterion,
                             double opacityScale, OpacityChoice opacity, AtmosphereChoice atmosphere,
                             OvershootScheme overshootScheme) {

    public PhysicsOptions {
        if (opacity == null) {
            throw new IllegalArgumentException("opacity must not be null; use OpacityChoice.BUILT_IN");
        }
        if (atmosphere == null) {
            throw new IllegalArgumentException("atmosphere must not be null");
        }
        if (overshootScheme == null) {
            throw new IllegalArgumentException("overshootScheme must not be null");
        }
    }

    /** Options with step overshoot. */
    public PhysicsOptions(double mixingLength, double overshoot, StabilityCriterion criterion, double opacityScale,
                          OpacityChoice opacity, AtmosphereChoice atmosphere) {
        this(mixingLength, overshoot, criterion, opacityScale, opacity, atmosphere, OvershootScheme.STEP);
    }

    /** Options with the default atmosphere ({@link AtmosphereChoice#DEFAULT}). */
    public PhysicsOptions(double mixingLength, double overshoot, StabilityCriterion criterion, double opacityScale,
                          OpacityChoice opacity) {
        this(mixingLength, overshoot, criterion, opacityScale, opacity, AtmosphereChoice.DEFAULT);
    }

    /** Options with the built-in opacity and the default atmosphere. */
    public PhysicsOptions(double mixingLength, double overshoot, StabilityCriterion criterion, double opacityScale) {
        this(mixingLength, overshoot, criterion, opacityScale, OpacityChoice.BUILT_IN);
    }

    /** Whether a user opacity table replaces the built-in opacity. */
    public boolean usesOpacityTable() {
        return opacity.isTable();
    }

    /** The path of the user opacity table, as the manifest records it; empty for the built-in opacity. */
    public String opacityTable() {
        return opacity.source();
    }

    /** The overshoot these options ask for. */
    public Overshoot overshootModel() {
        return overshootScheme.model(overshoot);
    }

    /** The same options with another atmosphere. */
    public PhysicsOptions withAtmosphere(AtmosphereChoice choice) {
        return new PhysicsOptions(mixingLength, overshoot, criterion, opacityScale, opacity, choice,
                overshootScheme);
    }

    /** The same options with another overshoot scheme. */
    public PhysicsOptions withOvershootScheme(OvershootScheme scheme) {
        return new PhysicsOptions(mixingLength, overshoot, criterion, opacityScale, opacity, atmosphere,
                scheme);
    }

    /** Defaults: alpha = 1.8, no overshoot (step scheme), Schwarzschild, opacity as built in, the default
     * atmosphere. */
    public static final PhysicsOptions DEFAULT = new PhysicsOptions(1.8, 0.0, StabilityCriterion.SCHWARZSCHILD, 1.0);
}
