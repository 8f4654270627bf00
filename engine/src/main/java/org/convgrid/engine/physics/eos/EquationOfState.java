package org.convgrid.engine.physics.eos;

import org.convgrid.engine.state.Composition;

/**
 * The thermodynamic state of stellar matter. Implementations are immutable and thread-safe.
 */
public interface EquationOfState {

    /**
     * @param density mass density, g cm^-3
     * @param temperature temperature, K
     * @param composition mass fractions
     * @return the full thermodynamic state
     */
    EosState atDensity(double density, double temperature, Composition composition);

    /**
     * Inverts the equation of state for the density.
     *
     * @param pressure total pressure (gas + radiation), dyn cm^-2
     * @param temperature temperature, K
     * @param composition mass fractions
     * @return the full thermodynamic state at the density that gives this pressure
     */
    EosState atPressure(double pressure, double temperature, Composition composition);
}
