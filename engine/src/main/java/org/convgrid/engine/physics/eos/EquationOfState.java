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
     * As {@link #atDensity(double, double, Composition)}, started from a solved state nearby (the same point at
     * the previous Newton iteration of a structure solve, or the unperturbed point of a finite difference): the
     * same state to the implementation's solve tolerance, in fewer internal iterations. {@code nearby} is only a
     * starting guess; it may belong to another composition or lie far away (then it merely saves less).
     *
     * @param nearby a state returned earlier by this equation of state
     */
    default EosState atDensity(double density, double temperature, Composition composition, EosState nearby) {
        return atDensity(density, temperature, composition);
    }

    /**
     * This equation of state at one fixed composition, for repeated calls with it (a point of a structure solve).
     * The default hands the composition to the methods above at each call; an implementation with per-composition
     * constants prepares them once here, with the same results.
     */
    default EosAtComposition atComposition(Composition composition) {
        return (density, temperature, nearby) -> nearby == null ? atDensity(density, temperature, composition)
                : atDensity(density, temperature, composition, nearby);
    }

    /**
     * Inverts the equation of state for the density.
     *
     * @param pressure total pressure (gas + radiation), dyn cm^-2
     * @param temperature temperature, K
     * @param composition mass fractions
     * @return the full thermodynamic state at the density that gives this pressure
     */
    EosState atPressure(double pressure, double temperature, Composition composition);

    /**
     * As {@link #atPressure(double, double, Composition)}, started from a solved state nearby (the previous point of
     * an atmosphere integration): the same state to the implementation's solve tolerance, in fewer internal
     * iterations. {@code nearby} is only a starting guess; it may lie far away (then it merely saves less).
     *
     * @param nearby a state returned earlier by this equation of state, for the same composition
     */
    default EosState atPressure(double pressure, double temperature, Composition composition, EosState nearby) {
        return atPressure(pressure, temperature, composition);
    }
}
