package org.convgrid.engine.evolution;

import org.convgrid.engine.physics.eos.EosState;
import org.convgrid.engine.structure.ExtraEnergy;

/**
 * The gravothermal energy release eps_grav = -c_P T (dlnT/dt - nabla_ad dlnP/dt) (Kippenhahn, Weigert &amp;
 * Weiss 2012, ch. 4), with the Lagrangian time derivatives taken as backward differences
 * between the previous model (same mesh, same mass coordinates) and the trial state of the step: first order
 * in time, implicit in the new state. c_P and nabla_ad are those of the trial state. Immutable and thread-safe.
 *
 * <p>Derivatives ({@link #withSlopes}), with A = D lnT - nabla_ad D lnP and dlnP = chi_rho dln rho + chi_T dlnT
 * (derived): d eps/dln rho = c_P T nabla_ad chi_rho / dt and d eps/dlnT = eps - c_P T (1 - nabla_ad chi_T) / dt.
 * They hold c_P and nabla_ad fixed (the equation of state gives no second derivatives); the terms left out are
 * A times dln c_P or dln nabla_ad, i.e. smaller than the kept ones by the change of the state over one step
 * (|A| ~ 1e-3 on the main sequence), too small to slow Newton's method.
 */
final class GravothermalEnergy implements ExtraEnergy {

    private final double[] previousLnT;
    private final double[] previousLnP;
    private final double dt;

    /**
     * @param previousLnT ln T of the previous model at each mesh point, T in K
     * @param previousLnP ln P of the previous model at each mesh point (with its own composition), P in dyn cm^-2
     * @param dt time step, s (&gt; 0)
     */
    GravothermalEnergy(double[] previousLnT, double[] previousLnP, double dt) {
        this.previousLnT = previousLnT.clone();
        this.previousLnP = previousLnP.clone();
        this.dt = dt;
    }

    @Override
    public double at(int shell, EosState state) {
        return -heatCapacityRate(state) * change(shell, state);
    }

    @Override
    public Rate withSlopes(int shell, EosState state) {
        double scale = heatCapacityRate(state);
        double eps = -scale * change(shell, state);
        double nablaAd = state.nablaAd();
        return new Rate(eps, scale * nablaAd * state.chiRho(), eps - scale * (1.0 - nablaAd * state.chiT()));
    }

    /** c_P T / dt, erg g^-1 s^-1. */
    private double heatCapacityRate(EosState state) {
        return state.cp() * state.temperature() / dt;
    }

    /** A = D lnT - nabla_ad D lnP since the previous model. */
    private double change(int shell, EosState state) {
        double dLnT = Math.log(state.temperature()) - previousLnT[shell];
        double dLnP = Math.log(state.pressure()) - previousLnP[shell];
        return dLnT - state.nablaAd() * dLnP;
    }
}
