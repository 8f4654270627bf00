package org.convgrid.engine.evolution;

import org.convgrid.engine.physics.eos.EosState;
import org.convgrid.engine.structure.ExtraEnergy;
import org.convgrid.engine.structure.StellarProfile;

/**
 * The gravothermal energy release in its conservative form, eps_grav = -du/dt + (P/rho^2) drho/dt = -du/dt
 * - P dv/dt, v = 1/rho (the first law of thermodynamics per unit mass, Kippenhahn, Weigert &amp; Weiss 2012,
 * ch. 4), over a step dt between the previous model (same mesh, same mass coordinates, its own composition) and
 * the trial state: eps_grav = -[u_new - u_old + (P_old + P_new)/2 (v_new - v_old)] / dt. Implicit in the new
 * state. Why this form and not -c_P T (dlnT - nabla_ad dlnP)/dt with the new c_P T: the internal-energy part is
 * a difference of the equation of state's own u, so summed over the steps it telescopes to u_end - u_start
 * exactly, whatever the steps; the compression work with the pressure averaged over the step (trapezoid) is
 * second order in time, and over the star it balances the change of the gravitational energy (hydrostatic
 * equilibrium). The end-of-step c_P T of the other form makes -T ds first order in time: measured on a
 * 0.5 Msun contraction from birth to 100 Myr, the energy radiated exceeded the nuclear release plus the drop of
 * the total energy by 1.43 % at the default steps and 0.81 % with all step limits halved (first order); with this
 * form by 0.63 % and 0.22 % (second order). The change of u with composition at fixed rho and T (particles lost
 * by burning) is part of the first law here. Immutable and thread-safe.
 *
 * <p>Derivatives ({@link #withSlopes}), from thermodynamic identities: (du/dln rho)_T = (P/rho)(1 - chi_T),
 * (du/dlnT)_rho = c_V T, dP/dln rho = chi_rho P, dP/dlnT = chi_T P, dv/dln rho = -v. So d eps/dln rho =
 * [-(P/rho)(1 - chi_T) - chi_rho P D v / 2 + P_mean v] / dt and d eps/dlnT = [-c_V T - chi_T P D v / 2] / dt,
 * with P_mean = (P_old + P_new)/2 and D v = v_new - v_old.
 */
final class GravothermalEnergy implements ExtraEnergy {

    private final double[] previousVolume;
    private final double[] previousPressure;
    private final double[] previousEnergy;
    private final double dt;
    /** eps_grav of the step before at each point (on this step's mesh), or null for the one-step form. */
    private final double[] earlierRate;
    /** Weight c of the two-step form, dt/(dt + the step before). */
    private final double weight;

    /**
     * @param previousVolume 1/rho of the previous model at each mesh point, cm^3 g^-1
     * @param previousPressure P of the previous model at each mesh point (with its own composition), dyn cm^-2
     * @param previousEnergy u of the previous model at each mesh point (with its own composition), erg g^-1
     * @param dt time step, s (&gt; 0)
     */
    GravothermalEnergy(double[] previousVolume, double[] previousPressure, double[] previousEnergy, double dt) {
        this.previousVolume = previousVolume.clone();
        this.previousPressure = previousPressure.clone();
        this.previousEnergy = previousEnergy.clone();
        this.dt = dt;
        this.earlierRate = null;
        this.weight = 0.0;
    }

    private GravothermalEnergy(GravothermalEnergy oneStep, double[] earlierRate, double weight) {
        this.previousVolume = oneStep.previousVolume;
        this.previousPressure = oneStep.previousPressure;
        this.previousEnergy = oneStep.previousEnergy;
        this.dt = oneStep.dt;
        this.earlierRate = earlierRate.clone();
        this.weight = weight;
    }

    /** The release over dt since the state {@code start} describes (its density, temperature and composition). */
    static GravothermalEnergy since(StepStart start, double dt) {
        int n = start.state().size();
        double[] v = new double[n];
        for (int k = 0; k < n; k++) {
            v[k] = 1.0 / start.density()[k];
        }
        return new GravothermalEnergy(v, start.pressure(), start.internalEnergy(), dt);
    }

    /**
     * The same release in the two-step form, second order at the end of the step: the one-step quotient (a
     * mid-step value) extrapolated to the end of the step through the quotient of the step before,
     * eps = (1 + c) eps_now - c eps_before with c = dt/(dt + dt_before), which is the backward differentiation
     * formula of order two for variable steps (Hairer, Norsett &amp; Wanner 1993, Solving Ordinary Differential
     * Equations I, ch. III.5). The one-step form sets dL/dm - eps_nuc at the end of the step equal to a
     * difference centred half a step earlier (implicit Euler, first order in time).
     *
     * @param earlierRate eps_grav of the step before at each point of this step's mesh, erg g^-1 s^-1
     * @param earlierStep the step before, s (&gt; 0)
     */
    GravothermalEnergy withEarlierStep(double[] earlierRate, double earlierStep) {
        return new GravothermalEnergy(this, earlierRate, dt / (dt + earlierStep));
    }

    /** The one-step release (the mid-step quotient) at each point of a converged model at the end of the step. */
    double[] oneStepRates(StellarProfile end) {
        double[] out = new double[end.size()];
        for (int k = 0; k < out.length; k++) {
            out[k] = oneStep(k, end.density(k), end.pressure(k), end.internalEnergy(k));
        }
        return out;
    }

    @Override
    public double at(int shell, EosState state) {
        double eps = oneStep(shell, state.density(), state.pressure(), state.internalEnergy());
        return earlierRate == null ? eps : (1.0 + weight) * eps - weight * earlierRate[shell];
    }

    @Override
    public Rate withSlopes(int shell, EosState state) {
        double v = 1.0 / state.density();
        double dv = v - previousVolume[shell];
        double p = state.pressure();
        double mean = 0.5 * (previousPressure[shell] + p);
        double eps = oneStep(shell, state.density(), p, state.internalEnergy());
        double dRho = (-p * v * (1.0 - state.chiT()) - 0.5 * state.chiRho() * p * dv + mean * v) / dt;
        double dT = (-state.cv() * state.temperature() - 0.5 * state.chiT() * p * dv) / dt;
        if (earlierRate == null) {
            return new Rate(eps, dRho, dT);
        }
        double f = 1.0 + weight;
        return new Rate(f * eps - weight * earlierRate[shell], f * dRho, f * dT);
    }

    /** The one-step release at a point of the given density, pressure and internal energy (the mid-step quotient). */
    private double oneStep(int shell, double density, double pressure, double internalEnergy) {
        double dv = 1.0 / density - previousVolume[shell];
        double work = 0.5 * (previousPressure[shell] + pressure) * dv;
        return -(internalEnergy - previousEnergy[shell] + work) / dt;
    }
}
