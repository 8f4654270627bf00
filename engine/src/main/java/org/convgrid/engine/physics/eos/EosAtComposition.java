package org.convgrid.engine.physics.eos;

/**
 * An {@link EquationOfState} at one fixed composition ({@link EquationOfState#atComposition}), for many calls with
 * it, e.g. one point of a structure solve over its Newton iterations: what depends on the composition alone is
 * prepared once instead of at every call. Immutable and thread-safe, as the equation of state it comes from.
 */
@FunctionalInterface
public interface EosAtComposition {

    /**
     * {@link EquationOfState#atDensity(double, double, org.convgrid.engine.state.Composition, EosState)} at this
     * composition, or the cold start of {@link EquationOfState#atDensity(double, double,
     * org.convgrid.engine.state.Composition)} when {@code nearby} is null: the same state either way.
     *
     * @param density g cm^-3
     * @param temperature K
     * @param nearby a state returned earlier by the same equation of state, or null
     */
    EosState atDensity(double density, double temperature, EosState nearby);
}
