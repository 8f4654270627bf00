package org.convgrid.engine.structure;

import org.convgrid.engine.physics.eos.EosState;

/**
 * An energy source per unit mass besides nuclear burning, added to dL/dm: for evolution the gravothermal term
 * eps_grav = -c_P T (dlnT/dt - nabla_ad dlnP/dt) (Kippenhahn, Weigert &amp; Weiss 2012, ch. 4), computed from the
 * previous time step's state of the shell and the trial state. Implementations must be smooth in the state
 * (the solver differentiates them numerically) and thread-safe.
 */
public interface ExtraEnergy {

    /** No extra source: the thermal-equilibrium (zero-age) case. */
    ExtraEnergy NONE = (shell, state) -> 0.0;

    /**
     * @param shell mesh point index
     * @param state trial thermodynamic state of that point
     * @return erg g^-1 s^-1
     */
    double at(int shell, EosState state);
}
