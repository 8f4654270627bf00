package org.convgrid.engine.physics.eos;

/**
 * Thermodynamic state at one point, cgs units. Derivatives are taken at fixed composition with the ionisation
 * equilibrium allowed to shift.
 *
 * @param density g cm^-3
 * @param temperature K
 * @param pressure total pressure, dyn cm^-2
 * @param internalEnergy specific internal energy including ionisation energy, erg g^-1
 * @param chiRho (dlnP/dln rho) at fixed T
 * @param chiT (dlnP/dlnT) at fixed rho
 * @param cp specific heat at constant pressure, erg g^-1 K^-1
 * @param cv specific heat at constant volume, erg g^-1 K^-1
 * @param gamma1 first adiabatic exponent (dlnP/dln rho) at fixed entropy
 * @param nablaAd adiabatic gradient (dlnT/dlnP) at fixed entropy
 * @param delta -(dln rho/dlnT) at fixed P
 * @param mu mean molecular weight (atomic mass units per free particle)
 * @param electronsPerBaryon free electrons per atomic mass unit, n_e m_u / rho
 * @param eta electron degeneracy parameter, chemical potential over kT (without rest mass)
 * @param gasPressureFraction beta = P_gas / P
 * @param dEtaDlnRho (d eta/d ln rho) at fixed T, NaN where the equation of state does not give it
 * @param dEtaDlnT (d eta/d ln T) at fixed rho, NaN where the equation of state does not give it
 */
public record EosState(double density, double temperature, double pressure, double internalEnergy,
                       double chiRho, double chiT, double cp, double cv, double gamma1, double nablaAd,
                       double delta, double mu, double electronsPerBaryon, double eta,
                       double gasPressureFraction, double dEtaDlnRho, double dEtaDlnT) {

    /** A state whose equation of state does not give the slopes of eta (they are NaN). */
    public EosState(double density, double temperature, double pressure, double internalEnergy,
                    double chiRho, double chiT, double cp, double cv, double gamma1, double nablaAd,
                    double delta, double mu, double electronsPerBaryon, double eta,
                    double gasPressureFraction) {
        this(density, temperature, pressure, internalEnergy, chiRho, chiT, cp, cv, gamma1, nablaAd, delta, mu,
                electronsPerBaryon, eta, gasPressureFraction, Double.NaN, Double.NaN);
    }
}
