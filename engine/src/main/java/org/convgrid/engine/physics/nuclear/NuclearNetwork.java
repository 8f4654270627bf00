package org.convgrid.engine.physics.nuclear;

import java.util.Optional;
import org.convgrid.engine.state.Composition;

/** Hydrogen burning: energy generation and composition rates. Implementations are immutable and thread-safe. */
public interface NuclearNetwork {

    /**
     * @param density g cm^-3
     * @param temperature K
     * @param composition mass fractions
     * @return energy generation (net of neutrino losses) and composition rates
     */
    BurningRate burn(double density, double temperature, Composition composition);

    /**
     * The composition with 3He and the CN isotopes at their local equilibrium abundances where these are reached
     * (used for zero-age models); hydrogen, 4He, oxygen and the other metals are unchanged apart from the
     * mass moved between them to keep the sum one.
     */
    Composition equilibrium(double density, double temperature, Composition composition);

    /**
     * {@link #burn} with the factors of its composition rates at this point, from which the Jacobian of the rates
     * follows without further calls of {@link #burn} ({@link RateFactors}, taken from the same evaluation of the
     * rates); no factors for a network whose rates have no such form (a caller then differences {@link #burn}).
     */
    default BurningAndFactors burnAndFactors(double density, double temperature, Composition composition) {
        return new BurningAndFactors(burn(density, temperature, composition), Optional.empty());
    }
}
