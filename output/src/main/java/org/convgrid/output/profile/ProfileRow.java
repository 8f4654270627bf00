package org.convgrid.output.profile;

/**
 * One shell of a model, in cgs as the engine computes it (the writer converts luminosity to solar units).
 *
 * @param massFrac m/M at the shell
 * @param radiusFrac r/R at the shell
 * @param pressure total pressure, dyn cm^-2
 * @param temperature K
 * @param density g cm^-3
 * @param luminosity luminosity through the shell, erg s^-1
 * @param opacity Rosseland mean opacity, cm^2 g^-1
 * @param nuclearEnergy nuclear energy generation rate, erg g^-1 s^-1
 * @param nabla actual temperature gradient d ln T / d ln P
 * @param nablaAd adiabatic gradient
 * @param nablaRad radiative gradient
 * @param convective whether the shell is convectively unstable under the model's criterion
 * @param convectiveVelocity mixing-length convective velocity, cm s^-1 (0 where radiative)
 * @param radius r, cm
 * @param gamma1 first adiabatic exponent
 * @param soundSpeed adiabatic sound speed sqrt(Gamma1 P / rho), cm s^-1
 * @param hydrogen hydrogen mass fraction
 * @param mu mean molecular weight from the equation of state
 * @param helium3 helium-3 mass fraction
 * @param buoyancySquared squared buoyancy frequency N^2, s^-2
 * @param exteriorMassFrac (M - m)/M at the shell, kept precise near the surface where m/M rounds to 1
 */
public record ProfileRow(double massFrac, double radiusFrac, double pressure, double temperature, double density,
                         double luminosity, double opacity, double nuclearEnergy, double nabla, double nablaAd,
                         double nablaRad, boolean convective, double convectiveVelocity, double radius,
                         double gamma1, double soundSpeed, double hydrogen, double mu, double helium3,
                         double buoyancySquared, double exteriorMassFrac) {
}
