package org.convgrid.engine.physics.opacity;

import org.convgrid.engine.state.Composition;

/** Rosseland-mean opacity. Implementations are immutable and thread-safe. */
public interface Opacity {

    /**
     * @param density g cm^-3
     * @param temperature K
     * @param composition mass fractions
     * @return kappa in cm^2 g^-1 and its logarithmic derivatives
     */
    OpacityValue rosselandMean(double density, double temperature, Composition composition);
}
