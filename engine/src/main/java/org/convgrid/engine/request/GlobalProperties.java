package org.convgrid.engine.request;

/**
 * Surface and central properties of a converged model, cgs units.
 *
 * @param luminosity erg s^-1
 * @param radius cm
 * @param effectiveTemperature K
 * @param surfaceGravity cm s^-2
 * @param centralTemperature K
 * @param centralDensity g cm^-3
 * @param centralHydrogen central hydrogen mass fraction
 * @param momentOfInertia the star's moment of inertia about a diameter, g cm^2 ({@code structure.MomentOfInertia})
 * @param envelopeMomentOfInertia the convective envelope's part of it, g cm^2 (the whole star's when fully
 *     convective); NaN without an envelope
 */
public record GlobalProperties(double luminosity, double radius, double effectiveTemperature,
                               double surfaceGravity, double centralTemperature, double centralDensity,
                               double centralHydrogen, double momentOfInertia, double envelopeMomentOfInertia) {

    /** Properties whose moments of inertia are not known (made without a model). */
    public GlobalProperties(double luminosity, double radius, double effectiveTemperature, double surfaceGravity,
                            double centralTemperature, double centralDensity, double centralHydrogen) {
        this(luminosity, radius, effectiveTemperature, surfaceGravity, centralTemperature, centralDensity,
                centralHydrogen, Double.NaN, Double.NaN);
    }
}
