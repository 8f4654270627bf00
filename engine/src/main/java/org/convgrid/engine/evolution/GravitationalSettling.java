package org.convgrid.engine.evolution;

import org.convgrid.engine.state.Composition;
import org.convgrid.engine.structure.StellarModel;
import org.convgrid.engine.structure.StellarProfile;
import org.convgrid.engine.units.Constants;

/**
 * Microscopic diffusion of helium and metals through hydrogen: the velocities with which pressure gradient,
 * gravity and the electric field of the electrons make the heavier ions sink, and the diffusion coefficient of
 * the concentration gradients that oppose them.
 *
 * <p>Physics: Burgers' (1969) flow equations for a fully ionised plasma of hydrogen (A = 1, Z = 1), helium (both
 * isotopes, A = 4, Z = 2) and the metals as one trace ion (oxygen, A = 16, Z = 8, fully ionised), with ideal
 * non-degenerate electrons whose pressure gradient sets the electric field (their own friction neglected, their
 * mass negligible), and without the residual heat-flow terms (no thermal diffusion). For species s,
 * dP_s/dr + rho_s g - Z_s n_s e E = sum_t K_st (w_t - w_s), e E = -(dP_e/dr)/n_e, and no net mass flow. With
 * hydrogen and helium the only important species the helium equation gives
 * w_He - w_H = -[dP_He/dr + rho_He g + (2 n_He/n_e) dP_e/dr]/K_HHe; the metals, a trace, drift through both.
 * The resistance coefficients of Coulomb collisions between two Maxwellian species are
 * K_st = (4/3) sqrt(2 pi mu_st) n_s n_t (Z_s Z_t e^2)^2 ln Lambda_st/(kT)^(3/2), from K_st = (16/3) n_s n_t mu_st
 * Omega_st^(1,1) (Burgers 1969) with the Chapman-Cowling collision integral of the screened Coulomb cross
 * section Q^(1) = 4 pi b_0^2 ln Lambda, b_0 = Z_s Z_t e^2/(mu g^2) (derived here); ln Lambda_st =
 * ln(1.123 kT lambda/(Z_s Z_t e^2)) (the speed average of ln(lambda/b_0)), at least 1, with lambda the larger of
 * the Debye length (electrons and ions) and the mean ion spacing (common practice). Thoul, Bahcall &amp; Loeb (1994, ApJ 421, 828) solve the full system
 * with heat flow and find it raises the diffusion velocities; without it ours are expected slower by ~20-30 %.
 *
 * <p>The velocity is split into a settling part (all concentration gradients set to zero) and a diffusion part
 * -D dln X/dr, with D = (rho_H/rho) (P_He/K_HHe) [1 + Y(3.75 mu - 2/(1 + X))] the concentration-diffusion
 * coefficient of helium in hydrogen (the bracket gathers the composition terms of the mean molecular weight and
 * of the electrons), used for every species (an approximation: the metals' own coefficient is a few times
 * smaller). Gradients: dln P/dr = -rho g/P (hydrostatic), dln T/dr = nabla dln P/dr, and at uniform
 * concentrations every partial pressure follows the gas pressure. Stateless.
 */
final class GravitationalSettling {

    /** Mass number of the representative metal ion (oxygen, the most abundant metal). */
    static final double METAL_MASS_NUMBER = 16.0;
    /** Its charge, fully ionised. */
    static final double METAL_CHARGE = 8.0;

    /**
     * Below this temperature, K, the velocities are set to zero: the ions are no longer fully ionised there (the
     * outer envelope, convective in the stars this is used for, where mixing overrides settling anyway).
     */
    static final double MIN_TEMPERATURE = 1.0e5;

    private static final double E2 = Constants.E_CHARGE * Constants.E_CHARGE;
    /**
     * ln Lambda averaged over the collision integral's speed weight gamma e^(-gamma^2): with b_0 = Z_s Z_t e^2/(2 kT
     * gamma^2), the mean of ln(lambda/b_0) is ln(2 kT lambda/(Z_s Z_t e^2)) - gamma_Euler = ln(1.123 kT lambda/...)
     * (derived here).
     */
    private static final double SPEED_AVERAGED_IMPACT = 2.0 * Math.exp(-0.5772156649015329);

    private GravitationalSettling() {
    }

    /**
     * Per point of a model: settling velocities relative to the centre of mass and the concentration-diffusion
     * coefficient.
     *
     * @param helium velocity of helium, cm s^-1, outward positive (negative: sinking)
     * @param metals velocity of the metals, cm s^-1
     * @param diffusion D, cm^2 s^-1
     */
    record Coefficients(double[] helium, double[] metals, double[] diffusion) {
    }

    static Coefficients of(StellarModel model) {
        StellarProfile p = model.profile();
        int n = p.size();
        double[] vHe = new double[n];
        double[] vZ = new double[n];
        double[] d = new double[n];
        for (int k = 1; k < n; k++) {
            double r = p.radius(k);
            double rho = p.density(k);
            double t = p.temperature(k);
            if (t < MIN_TEMPERATURE) {
                continue;
            }
            double pressure = p.pressure(k);
            double radiation = Constants.A_RAD * t * t * t * t / 3.0;
            double gasPressure = pressure - radiation;
            double g = Constants.G * p.mass(k) / (r * r);
            double dlnP = -rho * g / pressure;
            double dlnT = p.nabla(k) * dlnP;
            // at uniform concentrations every partial pressure follows the gas pressure, whose gradient is
            // hydrostatic (radiation taking its share): no finite difference, so a mu jump gives no spike
            double dlnPartial = (-rho * g - 4.0 * radiation * dlnT) / gasPressure;
            Composition c = model.state().composition(k);
            double[] v = velocities(rho, t, g, dlnPartial - dlnT, dlnT, c.x(), c.y(), c.z());
            vHe[k] = v[0];
            vZ[k] = v[1];
            d[k] = v[2];
        }
        return new Coefficients(vHe, vZ, d);
    }

    /**
     * The settling velocities at one point, for uniform concentrations.
     *
     * @param dlnRho d ln rho/dr, cm^-1
     * @param dlnT d ln T/dr, cm^-1
     * @return {v_He, v_Z, D} in cm s^-1, cm s^-1, cm^2 s^-1
     */
    static double[] velocities(double rho, double t, double g, double dlnRho, double dlnT, double x, double y,
                               double z) {
        double kt = Constants.K_B * t;
        double nH = rho * x / Constants.M_U;
        double nHe = rho * y / (4.0 * Constants.M_U);
        double nZ = rho * z / (METAL_MASS_NUMBER * Constants.M_U);
        double ne = nH + 2.0 * nHe + METAL_CHARGE * nZ;
        if (!(nH > 0.0) || !(nHe > 0.0)) {
            return new double[] {0.0, 0.0, 0.0};
        }
        double screening = ne + nH + 4.0 * nHe + METAL_CHARGE * METAL_CHARGE * nZ;
        double debye = Math.sqrt(kt / (4.0 * Math.PI * E2 * screening));
        double spacing = Math.cbrt(3.0 / (4.0 * Math.PI * (nH + nHe + nZ)));
        double lambda = Math.max(debye, spacing);
        double kHHe = resistance(1.0, 1.0, 4.0, 2.0, nH, nHe, kt, lambda);
        double kHZ = resistance(1.0, 1.0, METAL_MASS_NUMBER, METAL_CHARGE, nH, nZ, kt, lambda);
        double kHeZ = resistance(4.0, 2.0, METAL_MASS_NUMBER, METAL_CHARGE, nHe, nZ, kt, lambda);
        // uniform concentrations: dln n_s/dr = dln rho/dr for every species, also for the electrons
        double dlnPs = dlnRho + dlnT;
        double dPeDr = ne * kt * dlnPs;
        double rhoH = nH * Constants.M_U;
        double rhoHe = 4.0 * nHe * Constants.M_U;
        double forceHe = nHe * kt * dlnPs + rhoHe * g + (2.0 * nHe / ne) * dPeDr;
        double relative = -forceHe / kHHe;
        double vHe = rhoH / (rhoH + rhoHe) * relative;
        double vH = -rhoHe / (rhoH + rhoHe) * relative;
        double v = 0.0;
        if (nZ > 0.0) {
            double rhoZ = METAL_MASS_NUMBER * nZ * Constants.M_U;
            double forceZ = nZ * kt * dlnPs + rhoZ * g + (METAL_CHARGE * nZ / ne) * dPeDr;
            v = (kHZ * vH + kHeZ * vHe - forceZ) / (kHZ + kHeZ);
        }
        // the concentration terms of the helium force, P_He dln Y/dr [1 + Y(3.75 mu - 2/(1 + X))]: its own partial
        // pressure, the mean molecular weight in rho (mu^-1 = 2X + 3Y/4 + Z/2 at fixed Z) and the electrons
        // (n_e/rho proportional to 1 + X) (derived here)
        double mu = 1.0 / (2.0 * x + 0.75 * y + 0.5 * z);
        double concentration = 1.0 + y * (3.75 * mu - 2.0 / (1.0 + x));
        double diffusion = rhoH / (rhoH + rhoHe) * nHe * kt / kHHe * concentration;
        return new double[] {vHe, v, diffusion};
    }

    /** K_st of Coulomb collisions, g cm^-3 s^-1 (class comment). */
    static double resistance(double a1, double z1, double a2, double z2, double n1, double n2, double kt,
                             double lambda) {
        double mu = a1 * a2 / (a1 + a2) * Constants.M_U;
        double zz = z1 * z2 * E2;
        double lnLambda = Math.max(1.0, Math.log(SPEED_AVERAGED_IMPACT * kt * lambda / zz));
        return 4.0 / 3.0 * Math.sqrt(2.0 * Math.PI * mu) * n1 * n2 * zz * zz * lnLambda / (kt * Math.sqrt(kt));
    }
}
