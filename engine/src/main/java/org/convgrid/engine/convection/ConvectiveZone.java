package org.convgrid.engine.convection;

/**
 * One convective zone, its boundaries located by interpolating the sign change of the stability excess
 * between mesh points.
 *
 * @param innerMassFraction m/M at the bottom (0 for a core)
 * @param outerMassFraction m/M at the top (1 for an envelope reaching the surface)
 * @param innerRadiusFraction r/R at the bottom
 * @param outerRadiusFraction r/R at the top
 */
public record ConvectiveZone(double innerMassFraction, double outerMassFraction, double innerRadiusFraction,
                             double outerRadiusFraction) {
}
