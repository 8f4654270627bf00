package org.convgrid.engine.evolution;

import org.convgrid.engine.physics.eos.EosState;
import org.convgrid.engine.structure.ExtraEnergy;

/**
 * The gravothermal energy release eps_grav = -c_P T (dlnT/dt - nabla_ad dlnP/dt) (Kippenhahn, Weigert &amp;
 * Weiss 2012, ch. 4; formulas.md 6.1), with the Lagrangian time derivatives taken as backward differences
 * between the previous model (same mesh, same mass coordinates) and the trial state of the step: first order
 * in time, implicit in the new state. c_P and nabla_ad are those of the trial state. Immutable and thread-safe.
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
        double dLnT = Math.log(state.temperature()) - previousLnT[shell];
        double dLnP = Math.log(state.pressure()) - previousLnP[shell];
        return -state.cp() * state.temperature() * (dLnT - state.nablaAd() * dLnP) / dt;
    }
}
