package org.convgrid.engine.structure;

import org.convgrid.engine.physics.nuclear.NuclearNetwork;
import org.convgrid.engine.state.Composition;

/**
 * The composition of a shell as a function of its trial state, for compositions slaved to the structure (such
 * as 3He and CN at local equilibrium in a zero-age model). Implementations must be thread-safe.
 */
@FunctionalInterface
public interface ShellComposition {

    /**
     * @param shell mesh point index
     * @param density g cm^-3
     * @param temperature K
     */
    Composition at(int shell, double density, double temperature);

    /**
     * {@link #at}'s composition, returned, with the nuclear energy of {@code network} there in {@code into} and its
     * slopes taken as this rule's abundances follow the state: [0] eps, [1] d ln eps/d ln rho, [2] d ln eps/d ln T.
     * Null ({@code into} untouched) by default and for a rule or network without an analytic form: the caller then
     * differences {@link #at} and the network's burning.
     */
    default Composition atWithBurning(int shell, double density, double temperature, NuclearNetwork network,
                                      double[] into) {
        return null;
    }
}
