package org.convgrid.engine.physics.eos;

/**
 * Completes an {@link EosState} from P, u and the three basic derivatives with the exact thermodynamic identities
 * of Cox &amp; Giuli 1968 (ch. 9) and Kippenhahn, Weigert &amp; Weiss 2012 (ch. 4 and 6):
 * c_P = c_V + (P/(rho T)) chi_T^2/chi_rho, Gamma_1 = chi_rho c_P/c_V,
 * nabla_ad = P chi_T/(rho T c_P chi_rho), delta = chi_T/chi_rho.
 */
final class ThermoIdentities {

    private ThermoIdentities() {
    }

    /**
     * @param density g cm^-3
     * @param temperature K
     * @param pressure total pressure, dyn cm^-2
     * @param internalEnergy erg g^-1
     * @param chiRho (dlnP/dln rho)_T
     * @param chiT (dlnP/dlnT)_rho
     * @param cv (du/dT)_rho, erg g^-1 K^-1
     * @param mu atomic mass units per free particle
     * @param electronsPerBaryon free electrons per atomic mass unit
     * @param eta electron degeneracy parameter
     * @param beta gas pressure over total pressure
     */
    static EosState complete(double density, double temperature, double pressure, double internalEnergy,
                             double chiRho, double chiT, double cv, double mu, double electronsPerBaryon,
                             double eta, double beta) {
        return complete(density, temperature, pressure, internalEnergy, chiRho, chiT, cv, mu, electronsPerBaryon,
                eta, beta, Double.NaN, Double.NaN);
    }

    /** As above, with the slopes of eta, (d eta/d ln rho)_T and (d eta/d ln T)_rho, that the state carries. */
    static EosState complete(double density, double temperature, double pressure, double internalEnergy,
                             double chiRho, double chiT, double cv, double mu, double electronsPerBaryon,
                             double eta, double beta, double dEtaDlnRho, double dEtaDlnT) {
        double prt = pressure / (density * temperature);
        // delta = chi_T/chi_rho, so c_P = c_V + prt chi_T delta and nabla_ad = prt delta/c_P (fewer divisions)
        double delta = chiT / chiRho;
        double cp = cv + prt * chiT * delta;
        double gamma1 = chiRho * cp / cv;
        double nablaAd = prt * delta / cp;
        return new EosState(density, temperature, pressure, internalEnergy, chiRho, chiT, cp, cv, gamma1, nablaAd,
                delta, mu, electronsPerBaryon, eta, beta, dEtaDlnRho, dEtaDlnT);
    }
}
