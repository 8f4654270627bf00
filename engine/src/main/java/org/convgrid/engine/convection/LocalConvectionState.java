package org.convgrid.engine.convection;

/**
 * Local conditions at one point, cgs units.
 *
 * @param temperature K
 * @param density g cm^-3
 * @param pressure dyn cm^-2
 * @param gravity local gravity G m / r^2, cm s^-2
 * @param opacity Rosseland mean, cm^2 g^-1
 * @param cp specific heat at constant pressure, erg g^-1 K^-1
 * @param delta -(dln rho/dln T) at fixed P
 * @param nablaRad radiative gradient
 * @param nablaAd adiabatic gradient
 * @param nablaStability the gradient nabla_rad is compared with: nabla_ad (Schwarzschild) or nabla_L (Ledoux)
 */
public record LocalConvectionState(double temperature, double density, double pressure, double gravity,
                                   double opacity, double cp, double delta, double nablaRad, double nablaAd,
                                   double nablaStability) {
}
