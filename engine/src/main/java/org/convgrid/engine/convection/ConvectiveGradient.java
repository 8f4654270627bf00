package org.convgrid.engine.convection;

/**
 * Result of the convection model at one point.
 *
 * @param nabla actual gradient dlnT/dlnP of the surroundings
 * @param nablaElement gradient inside a rising element
 * @param velocity convective velocity, cm s^-1 (0 where stable)
 * @param mixingLength mixing length alpha H_P, cm
 * @param convective whether the point is convectively unstable under the criterion in use
 */
public record ConvectiveGradient(double nabla, double nablaElement, double velocity, double mixingLength,
                                 boolean convective) {
}
