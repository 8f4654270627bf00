package org.convgrid.engine.structure;

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
}
