package org.convgrid.engine.physics.opacity;

import org.convgrid.engine.state.Composition;

/**
 * An opacity term that takes ln rho and ln T from its caller as well, so that a composite of several terms (and the
 * tables' analytic edges) takes each logarithm once per call instead of once per term: below the tables the
 * analytic terms are a hot path. Package-private; {@link Opacity#rosselandMean} stays the public entry, and each
 * implementation answers it by taking the two logarithms itself.
 */
interface LogArgumentsOpacity extends Opacity {

    /**
     * {@link Opacity#rosselandMean} with lnDensity = ln rho and lnTemperature = ln T given (rounding differences of
     * the caller's logarithms move the result by a few ulp only).
     */
    OpacityValue rosselandMean(double density, double temperature, double lnDensity, double lnTemperature,
                               Composition composition);

    /** The term at (rho, T) with the given logarithms when it takes them, through its public entry otherwise. */
    static OpacityValue evaluate(Opacity term, double density, double temperature, double lnDensity,
                                 double lnTemperature, Composition composition) {
        return term instanceof LogArgumentsOpacity withLogs
                ? withLogs.rosselandMean(density, temperature, lnDensity, lnTemperature, composition)
                : term.rosselandMean(density, temperature, composition);
    }
}
