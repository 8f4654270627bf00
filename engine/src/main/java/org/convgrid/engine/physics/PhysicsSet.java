package org.convgrid.engine.physics;

import org.convgrid.engine.convection.ConvectiveTransport;
import org.convgrid.engine.convection.StabilityCriterion;
import org.convgrid.engine.physics.atmosphere.SurfaceBoundary;
import org.convgrid.engine.physics.eos.EquationOfState;
import org.convgrid.engine.physics.nuclear.NuclearNetwork;
import org.convgrid.engine.physics.opacity.Opacity;
import org.convgrid.engine.overshoot.Overshoot;
import org.convgrid.engine.overshoot.StepOvershoot;

/**
 * Everything the structure solver needs to know about the physics, as one immutable bundle.
 *
 * @param eos equation of state
 * @param opacity Rosseland-mean opacity
 * @param nuclear hydrogen-burning network
 * @param convection actual gradient in unstable layers (mixing-length theory with its alpha)
 * @param criterion Schwarzschild or Ledoux
 * @param surface outer boundary condition
 * @param overshoot mixing beyond the formal convective boundaries
 */
public record PhysicsSet(EquationOfState eos, Opacity opacity, NuclearNetwork nuclear,
                         ConvectiveTransport convection, StabilityCriterion criterion, SurfaceBoundary surface,
                         Overshoot overshoot) {

    public PhysicsSet {
        if (overshoot == null) {
            throw new IllegalArgumentException("overshoot must not be null");
        }
    }

    /** A set with step overshoot of {@code overshootHp} pressure scale heights. */
    public PhysicsSet(EquationOfState eos, Opacity opacity, NuclearNetwork nuclear, ConvectiveTransport convection,
                      StabilityCriterion criterion, SurfaceBoundary surface, double overshootHp) {
        this(eos, opacity, nuclear, convection, criterion, surface, new StepOvershoot(overshootHp));
    }
}
