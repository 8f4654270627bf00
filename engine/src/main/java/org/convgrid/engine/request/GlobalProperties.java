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
 */
public record GlobalProperties(double luminosity, double radius, double effectiveTemperature,
                               double surfaceGravity, double centralTemperature, double centralDensity,
                               double centralHydrogen) {
}
