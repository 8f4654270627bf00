package org.convgrid.engine.birth;

import org.convgrid.engine.physics.eos.EosState;
import org.convgrid.engine.structure.ExtraEnergy;

/**
 * The gravothermal release of a star contracting homologously at the rate x = -dlnR/dt: every mass element keeps
 * its m and its r/R, so for an ideal gas dlnT/dt = x and dlnP/dt = 4x (Kippenhahn, Weigert &amp; Weiss 2012,
 * Stellar Structure and Evolution, ch. 20.3), and eps_grav = -c_P T (dlnT/dt - nabla_ad dlnP/dt) becomes
 * x c_P T (4 nabla_ad - 1). Used only to relax the start model, whose contraction the evolution then takes over
 * with the true time differences. The slopes hold c_P and nabla_ad fixed (good enough for Newton's method).
 * Immutable and thread-safe.
 */
final class HomologousContraction implements ExtraEnergy {

    private final double rate;

    /** @param rate x = -dlnR/dt, s^-1 (positive for contraction) */
    HomologousContraction(double rate) {
        this.rate = rate;
    }

    @Override
    public double at(int shell, EosState state) {
        return rate * state.cp() * state.temperature() * (4.0 * state.nablaAd() - 1.0);
    }

    @Override
    public Rate withSlopes(int shell, EosState state) {
        double eps = at(shell, state);
        return new Rate(eps, 0.0, eps);
    }
}
