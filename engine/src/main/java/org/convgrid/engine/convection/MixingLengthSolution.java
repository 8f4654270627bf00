package org.convgrid.engine.convection;

/**
 * The mixing-length gradient at one point with the partial derivatives a Newton solver needs.
 * The derivatives follow from implicit differentiation of the cubic (see {@link MixingLengthTheory}); in a
 * stable layer nabla = nabla_rad, so dNablaDNablaRad = 1 and the other two vanish.
 *
 * @param gradient the actual and element gradients, the convective velocity and the mixing length
 * @param efficiency the dimensionless parameter U of Kippenhahn, Weigert &amp; Weiss (0 where stable)
 * @param dNablaDNablaRad (d nabla / d nabla_rad) at fixed nabla_ad and U
 * @param dNablaDNablaAd (d nabla / d nabla_ad) at fixed nabla_rad and U
 * @param dNablaDLnU (d nabla / d ln U) at fixed nabla_rad and nabla_ad; U scales as T^3 / (c_P rho^2 kappa)
 *        times alpha^-2 H_P^-3/2 (g delta)^-1/2, so the solver chains it through ln U
 */
public record MixingLengthSolution(ConvectiveGradient gradient, double efficiency, double dNablaDNablaRad,
                                   double dNablaDNablaAd, double dNablaDLnU) {
}
