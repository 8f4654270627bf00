package org.convgrid.engine.physics;

import org.convgrid.engine.convection.ConvectiveTransport;
import org.convgrid.engine.convection.StabilityCriterion;
import org.convgrid.engine.physics.atmosphere.SurfaceBoundary;
import org.convgrid.engine.physics.eos.EquationOfState;
import org.convgrid.engine.physics.nuclear.NuclearNetwork;
import org.convgrid.engine.physics.opacity.Opacity;

/**
 * Everything the structure solver needs to know about the physics, as one immutable bundle.
 *
 * @param eos equation of state
 * @param opacity Rosseland-mean opacity
 * @param nuclear hydrogen-burning network
 * @param convection actual gradient in unstable layers (mixing-length theory with its alpha)
 * @param criterion Schwarzschild or Ledoux
 * @param surface outer boundary condition
 * @param overshootHp overshoot parameter (0 for none): alpha_ov in pressure scale heights for the step scheme,
 *                    f for the exponential one
 * @param overshootScheme step or exponential overshoot
 */
public record PhysicsSet(EquationOfState eos, Opacity opacity, NuclearNetwork nuclear,
                         ConvectiveTransport convection, StabilityCriterion criterion, SurfaceBoundary surface,
                         double overshootHp, OvershootScheme overshootScheme) {

    public PhysicsSet {
        if (overshootScheme == null) {
            throw new IllegalArgumentException("overshootScheme must not be null");
        }
    }

    /** A set with step overshoot. */
    public PhysicsSet(EquationOfState eos, Opacity opacity, NuclearNetwork nuclear, ConvectiveTransport convection,
                      StabilityCriterion criterion, SurfaceBoundary surface, double overshootHp) {
        this(eos, opacity, nuclear, convection, criterion, surface, overshootHp, OvershootScheme.STEP);
    }
}
