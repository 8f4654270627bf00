package org.convgrid.engine.evolution;

import java.util.Arrays;

import org.convgrid.engine.state.Composition;
import org.convgrid.engine.structure.StellarModel;
import org.convgrid.engine.structure.StellarProfile;
import org.convgrid.engine.units.Constants;

/**
 * Microscopic diffusion of helium and metals through hydrogen: the velocities with which pressure gradient,
 * gravity, the electric field of the electrons and the temperature gradient make the heavier ions sink, and the
 * diffusion coefficient of the concentration gradients that oppose them.
 *
 * <p>Physics: Burgers' (1969) flow equations with the residual heat flows, solved in full ({@link BurgersFlow}) as
 * Thoul, Bahcall &amp; Loeb (1994, ApJ 421, 828) do, for a fully ionised plasma of hydrogen (A = 1, Z = 1), helium
 * (both isotopes, A = 4, Z = 2), the metals as one ion (oxygen, A = 16, Z = 8, fully ionised) and non-degenerate
 * electrons: gravitational settling, thermal diffusion and, for the concentration gradients, ordinary diffusion.
 * The resistance coefficients of Coulomb collisions between two Maxwellian species are
 * K_st = (4/3) sqrt(2 pi mu_st) n_s n_t (Z_s Z_t e^2)^2 ln Lambda_st/(kT)^(3/2), from K_st = (16/3) n_s n_t mu_st
 * Omega_st^(1,1) (Burgers 1969) with the Chapman-Cowling collision integral of the momentum-transfer cross section
 * of the Debye-screened Coulomb potential (Z_s Z_t e^2/r) e^(-r/lambda), whose large-Lambda form is
 * Q^(1) = 4 pi b_0^2 (ln(lambda/b_0) + ln 2 - gamma_Euler - 1/2), b_0 = Z_s Z_t e^2/(mu g^2) (Liboff 1959, Phys.
 * Fluids 2, 40, from memory; checked here by integrating the classical deflection in that potential: the constant
 * is -0.395 at lambda/b_0 = 1000, -0.447 at 100, -0.506 at 30, against ln 2 - gamma - 1/2 = -0.384; Paquette et
 * al. 1986, ApJS 61, 177, tabulate the exact integrals). Its speed average gives ln Lambda_st =
 * ln(0.765 kT lambda/(Z_s Z_t e^2)) (derived here), at least 1, with lambda the larger of the Debye length
 * (electrons and ions) and the mean ion spacing (common practice). A bare Coulomb cross section cut off at b =
 * lambda (ln(lambda/b_0) alone) overstates ln Lambda by 0.38, i.e. the resistance of helium on hydrogen at the
 * solar envelope base (ln Lambda ~ 2.4) by ~16 %.
 *
 * <p>The velocity is split into a settling part (all concentrations uniform: every number density follows the
 * mass density, so the pressure, temperature and gravity terms, thermal diffusion included) and a diffusion part
 * -D dln X/dr, with D_He the response of helium's velocity to a gradient of ln Y at fixed Z, gas pressure and
 * temperature, from the same equations, and D_Z that of the metals' velocity to a gradient of ln Z at fixed Y
 * (about ten times smaller: their charge brakes them); deuterium diffuses with helium's coefficient, 7Li with the
 * metals'. Gradients: dln P/dr = -rho g/P (hydrostatic), dln T/dr = nabla dln P/dr, and at uniform
 * concentrations every partial pressure follows the gas pressure. Stateless.
 */
final class GravitationalSettling {

    /** Mass number of the representative metal ion (oxygen, the most abundant metal). */
    static final double METAL_MASS_NUMBER = 16.0;
    /** Its charge, fully ionised. */
    static final double METAL_CHARGE = 8.0;
    /** Index of the electrons among the species of {@link #velocities}. */
    private static final int ELECTRONS = 2;
    /** The electron's mass in atomic mass units. */
    static final double ELECTRON_MASS_NUMBER = Constants.M_E / Constants.M_U;

    /**
     * Below this temperature, K, the velocities are set to zero: the ions are no longer fully ionised there (the
     * outer envelope, convective in the stars this is used for, where mixing overrides settling anyway).
     */
    static final double MIN_TEMPERATURE = 1.0e5;

    private static final double E2 = Constants.E_CHARGE * Constants.E_CHARGE;
    /**
     * ln Lambda averaged over the collision integral's speed weight gamma e^(-gamma^2): with b_0 = Z_s Z_t e^2/(2 kT
     * gamma^2), the mean of ln(lambda/b_0) + ln 2 - gamma_Euler - 1/2 (the screened potential's cross section, class
     * comment) is ln(2 kT lambda/(Z_s Z_t e^2)) + ln 2 - 2 gamma_Euler - 1/2 = ln(0.765 kT lambda/...) (derived here).
     */
    private static final double SPEED_AVERAGED_IMPACT = 4.0 * Math.exp(-2.0 * 0.5772156649015329 - 0.5);

    private GravitationalSettling() {
    }

    /**
     * Per point of a model: settling velocities relative to the centre of mass and the concentration-diffusion
     * coefficient.
     *
     * @param helium velocity of helium, cm s^-1, outward positive (negative: sinking)
     * @param metals velocity of the metals, cm s^-1
     * @param diffusion D of helium, cm^2 s^-1
     * @param metalDiffusion D of the metals, cm^2 s^-1
     */
    record Coefficients(double[] helium, double[] metals, double[] diffusion, double[] metalDiffusion) {
    }

    static Coefficients of(StellarModel model) {
        StellarProfile p = model.profile();
        int n = p.size();
        double[] vHe = new double[n];
        double[] vZ = new double[n];
        double[] d = new double[n];
        double[] dZ = new double[n];
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
            double[] v = velocities(rho, t, dlnPartial - dlnT, dlnT, c.x(), c.y(), c.z(), true);
            vHe[k] = v[0];
            vZ[k] = v[1];
            d[k] = v[2];
            dZ[k] = v[3];
        }
        return new Coefficients(vHe, vZ, d, dZ);
    }

    /**
     * The diffusion velocities at one point for uniform concentrations, and the concentration-diffusion
     * coefficients of helium and of the metals, from {@link BurgersFlow} with hydrogen, helium, the metal ion and
     * the electrons.
     *
     * @param dlnRho d ln rho/dr, cm^-1
     * @param dlnT d ln T/dr, cm^-1
     * @param heatFlow whether the residual heat flows (thermal diffusion) are included
     * @return {v_He, v_Z, D_He, D_Z} in cm s^-1, cm s^-1, cm^2 s^-1, cm^2 s^-1
     */
    static double[] velocities(double rho, double t, double dlnRho, double dlnT, double x, double y, double z,
                               boolean heatFlow) {
        double kt = Constants.K_B * t;
        double nH = rho * x / Constants.M_U;
        double nHe = rho * y / (4.0 * Constants.M_U);
        double nZ = rho * z / (METAL_MASS_NUMBER * Constants.M_U);
        double ne = nH + 2.0 * nHe + METAL_CHARGE * nZ;
        if (!(nH > 0.0) || !(nHe > 0.0)) {
            return new double[] {0.0, 0.0, 0.0, 0.0};
        }
        boolean metals = nZ > 0.0;
        // species: hydrogen, helium, electrons, then the metal ion when there is one
        double[] a = metals ? new double[] {1.0, 4.0, ELECTRON_MASS_NUMBER, METAL_MASS_NUMBER}
                : new double[] {1.0, 4.0, ELECTRON_MASS_NUMBER};
        double[] charge = metals ? new double[] {1.0, 2.0, -1.0, METAL_CHARGE} : new double[] {1.0, 2.0, -1.0};
        double[] n = metals ? new double[] {nH, nHe, ne, nZ} : new double[] {nH, nHe, ne};
        double screening = ne + nH + 4.0 * nHe + METAL_CHARGE * METAL_CHARGE * nZ;
        double debye = Math.sqrt(kt / (4.0 * Math.PI * E2 * screening));
        double spacing = Math.cbrt(3.0 / (4.0 * Math.PI * (nH + nHe + nZ)));
        double lambda = Math.max(debye, spacing);
        int species = n.length;
        double[][] k = new double[species][species];
        double[] mass = new double[species];
        for (int s = 0; s < species; s++) {
            mass[s] = a[s] * Constants.M_U;
            for (int u = 0; u < species; u++) {
                k[s][u] = resistance(a[s], Math.abs(charge[s]), a[u], Math.abs(charge[u]), n[s], n[u], kt, lambda);
            }
        }
        BurgersFlow flow = new BurgersFlow(mass, charge, n, kt, k);
        // uniform concentrations: every number density follows the mass density
        double[] uniform = new double[species];
        Arrays.fill(uniform, dlnRho);
        double[] w = flow.velocities(uniform, dlnT, heatFlow);
        // a unit gradient of ln Y at fixed Z (hydrogen making up the difference), gas pressure and temperature: the
        // response of helium's velocity is -D_He; likewise a unit gradient of ln Z at fixed Y gives -D_Z
        double diffusion = -flow.velocities(concentrationGradient(n, charge, 1, -y / x), 0.0, heatFlow)[1];
        double metalDiffusion = metals
                ? -flow.velocities(concentrationGradient(n, charge, 3, -z / x), 0.0, heatFlow)[3] : diffusion;
        return new double[] {w[1], metals ? w[3] : 0.0, diffusion, metalDiffusion};
    }

    /**
     * d ln n_s/dr for a unit gradient of the mass fraction of species {@code s} (hydrogen, species 0, changing by
     * {@code hydrogenShare} times as much in ln), the electrons following neutrality and the density adjusting so
     * that the particle count (the gas pressure at fixed temperature) stays put.
     */
    private static double[] concentrationGradient(double[] n, double[] charge, int s, double hydrogenShare) {
        int species = n.length;
        double[] c = new double[species];
        c[0] = hydrogenShare;
        c[s] = 1.0;
        double electrons = 0.0;
        for (int t = 0; t < species; t++) {
            if (charge[t] > 0.0) {
                electrons += charge[t] * n[t] * c[t];
            }
        }
        c[ELECTRONS] = electrons / n[ELECTRONS];
        double particles = 0.0;
        double shift = 0.0;
        for (int t = 0; t < species; t++) {
            particles += n[t];
            shift -= n[t] * c[t];
        }
        double[] gradient = new double[species];
        for (int t = 0; t < species; t++) {
            gradient[t] = c[t] + shift / particles;
        }
        return gradient;
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
