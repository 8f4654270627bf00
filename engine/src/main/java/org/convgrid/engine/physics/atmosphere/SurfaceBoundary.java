package org.convgrid.engine.physics.atmosphere;

import org.convgrid.engine.state.Composition;

/** Pressure and temperature at the point where the interior is fitted to the atmosphere. Thread-safe. */
public interface SurfaceBoundary {

    /**
     * @param effectiveTemperature K
     * @param gravity surface gravity, cm s^-2
     * @param composition surface mass fractions
     * @return ln P and ln T at the fitting point, with their derivatives by ln Teff and ln g
     */
    SurfaceCondition at(double effectiveTemperature, double gravity, Composition composition);
}
