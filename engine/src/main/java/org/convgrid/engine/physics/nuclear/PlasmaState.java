package org.convgrid.engine.physics.nuclear;

import org.convgrid.engine.units.Constants;

/**
 * The plasma quantities that set electron screening at one point, for unit charges.
 *
 * <p>{@code debyeCoupling = e^2/(lambda_D kT)} with {@code lambda_D^-2 = 4 pi e^2 rho N_A zeta^2/kT},
 * {@code zeta^2 = sum_i (Z_i^2 + Z_i) X_i/A_i} (ions plus non-degenerate electrons, theta_e = 1), so
 * {@code debyeCoupling = 0.188 zeta rho^(1/2) T6^(-3/2)} (Salpeter 1954, Aust. J. Phys. 7, 373; the 0.188 is
 * derived here from e, k and N_A). {@code electronCoupling = Gamma_e = e^2 (4 pi n_e/3)^(1/3)/kT
 * = 0.2275 (rho/mu_e)^(1/3)/T6}. At fixed composition the first scales as rho^(1/2) T^(-3/2), the second as
 * rho^(1/3) T^(-1); screening implementations rely on these scalings for their derivatives.
 *
 * @param density g cm^-3
 * @param temperature K
 * @param debyeCoupling e^2/(lambda_D kT), dimensionless
 * @param electronCoupling Gamma_e, dimensionless
 */
public record PlasmaState(double density, double temperature, double debyeCoupling, double electronCoupling) {

    /** e^2/(lambda_D kT) = DEBYE_COEFFICIENT zeta rho^(1/2) T6^(-3/2): e^3 (4 pi N_A)^(1/2) (k 1e6 K)^(-3/2). */
    public static final double DEBYE_COEFFICIENT = Math.pow(Constants.E_CHARGE, 3) * Math.sqrt(4.0 * Math.PI * Constants.N_A)
            / Math.pow(Constants.K_B * 1.0e6, 1.5);
    /** Gamma_e = ELECTRON_COUPLING_COEFFICIENT (rho/mu_e)^(1/3)/T6: e^2 (4 pi N_A/3)^(1/3)/(k 1e6 K). */
    public static final double ELECTRON_COUPLING_COEFFICIENT = Constants.E_CHARGE * Constants.E_CHARGE
            * Math.cbrt(4.0 * Math.PI * Constants.N_A / 3.0) / (Constants.K_B * 1.0e6);

    /**
     * @param density g cm^-3
     * @param temperature K
     * @param zetaSquared sum_i (Z_i^2 + Z_i) X_i/A_i, mol g^-1
     * @param electronsPerBaryon 1/mu_e = sum_i Z_i X_i/A_i, mol g^-1
     */
    public static PlasmaState of(double density, double temperature, double zetaSquared, double electronsPerBaryon) {
        double t6 = temperature * 1.0e-6;
        double debye = DEBYE_COEFFICIENT * Math.sqrt(zetaSquared * density) / (t6 * Math.sqrt(t6));
        double gamma = ELECTRON_COUPLING_COEFFICIENT * Math.cbrt(density * electronsPerBaryon) / t6;
        return new PlasmaState(density, temperature, debye, gamma);
    }
}
