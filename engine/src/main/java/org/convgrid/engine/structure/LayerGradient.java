package org.convgrid.engine.structure;

import org.convgrid.engine.convection.LedouxGradient;
import org.convgrid.engine.convection.LocalConvectionState;
import org.convgrid.engine.physics.PhysicsSet;
import org.convgrid.engine.physics.eos.EosState;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.units.Constants;

/**
 * The actual temperature gradient dln T/dln P of a chemically homogeneous layer (nabla_mu = 0), as the structure
 * equations take it: nabla_rad = 3 kappa L P/(16 pi a c G m T^4) (radiative diffusion; Kippenhahn, Weigert &amp;
 * Weiss 2012, Stellar Structure and Evolution, ch. 5) where it does not exceed the stability gradient, else the
 * gradient of the physics' convection model with g = G m/r^2. With no composition gradient the stability gradient
 * is nabla_ad under either criterion. For guesses that integrate a layer outside the solver (an envelope below the
 * atmosphere, a seed's outer envelope). Immutable and thread-safe.
 */
public final class LayerGradient {

    /** C in nabla_rad = C kappa L P/(m T^4): 3/(16 pi a c G), cgs. */
    private static final double RADIATIVE_CONSTANT = 3.0 / (16.0 * Math.PI * Constants.A_RAD * Constants.C
            * Constants.G);
    /**
     * phi = (dln rho/dln mu) at fixed P and T in the Ledoux gradient: 1 for the ideal ions and electrons that carry
     * mu (Kippenhahn, Weigert &amp; Weiss 2012, ch. 6); the structure equations' too. With nabla_mu = 0, as here, it
     * does not enter.
     */
    static final double IDEAL_GAS_PHI = 1.0;

    private final PhysicsSet physics;

    /** @param physics its opacity, convection model and stability criterion */
    public LayerGradient(PhysicsSet physics) {
        this.physics = physics;
    }

    /**
     * nabla_rad = 3 kappa L P/(16 pi a c G m T^4).
     *
     * @param kappa Rosseland mean opacity, cm^2 g^-1
     * @param luminosity erg s^-1
     * @param pressure dyn cm^-2
     * @param mass the mass inside the layer, g
     * @param temperature K
     */
    public static double radiative(double kappa, double luminosity, double pressure, double mass,
                                   double temperature) {
        return RADIATIVE_CONSTANT * kappa * luminosity * pressure / (mass * temperature * temperature * temperature
                * temperature);
    }

    /**
     * dln T/dln P in the state {@code gas}.
     *
     * @param mass the mass inside the layer, g
     * @param radius the layer's radius, cm
     * @param luminosity the luminosity through it, erg s^-1
     */
    public double nabla(EosState gas, Composition composition, double mass, double radius, double luminosity) {
        double t = gas.temperature();
        double p = gas.pressure();
        double kappa = physics.opacity().rosselandMean(gas.density(), t, composition).kappa();
        double rad = radiative(kappa, luminosity, p, mass, t);
        double stability = LedouxGradient.stabilityGradient(physics.criterion(), gas.nablaAd(), IDEAL_GAS_PHI,
                gas.delta(), 0.0);
        if (rad <= stability) {
            return rad;
        }
        LocalConvectionState local = new LocalConvectionState(t, gas.density(), p, Constants.G * mass
                / (radius * radius), kappa, gas.cp(), gas.delta(), rad, gas.nablaAd(), stability);
        return physics.convection().gradient(local).nabla();
    }
}
