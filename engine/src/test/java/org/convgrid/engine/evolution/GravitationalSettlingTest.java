package org.convgrid.engine.evolution;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.Test;

class GravitationalSettlingTest {

    /** Conditions at the base of the solar convective envelope (Bahcall, Serenelli & Basu 2005 model, rounded). */
    private static final double RHO = 0.19;
    private static final double T = 2.2e6;
    private static final double G = Constants.GM_SUN / Math.pow(0.713 * Constants.R_SUN, 2);

    @Test
    void traceHeliumInIsothermalHydrogenSinksAtTheHandDerivedSpeed() {
        // Derived here (D) from the class's equations: isothermal, hydrostatic ionised hydrogen has
        // dln rho/dr = -mu m_u g/kT with mu = 1/2; the force on trace helium is then
        // n_He kT dln rho/dr (1 + Z_He) + 4 m_u n_He g = 2.5 n_He m_u g, and v_He = -2.5 n_He m_u g/K_HHe.
        double x = 1.0 - 1e-6;
        double y = 1e-6;
        double kt = Constants.K_B * T;
        double dlnRho = -0.5 * Constants.M_U * G / kt;
        double[] v = GravitationalSettling.velocities(RHO, T, G, dlnRho, 0.0, x, y, 0.0);
        double nH = RHO * x / Constants.M_U;
        double nHe = RHO * y / (4.0 * Constants.M_U);
        double debye = Math.sqrt(kt / (4 * Math.PI * Constants.E_CHARGE * Constants.E_CHARGE
                * (nH + nH + 4 * nHe + 2 * nHe)));
        double k = GravitationalSettling.resistance(1, 1, 4, 2, nH, nHe, kt, debye);
        assertThat(v[0]).isCloseTo(-2.5 * nHe * Constants.M_U * G / k, within(1e-5 * Math.abs(v[0]))); // trace limit: O(y) terms
    }

    @Test
    void heliumAndMetalsSinkAtTheSolarEnvelopeBase() {
        // Thoul, Bahcall & Loeb 1994 (ApJ 421, 828): helium and heavy elements sink relative to hydrogen in the
        // solar interior, the heavy elements at a speed comparable to helium's (from memory: within tens of per
        // cent). Our metals are fully ionised oxygen, whose large charge brakes it: ~0.5 of helium's speed
        double kt = Constants.K_B * T;
        double mu = 0.6;
        double hp = kt / (mu * Constants.M_U * G);
        double dlnRho = -0.6 / hp; // nabla ~ 0.4 at the envelope base: dln rho = (1 - nabla) dln P
        double dlnT = -0.4 / hp;
        double[] v = GravitationalSettling.velocities(RHO, T, G, dlnRho, dlnT, 0.74, 0.245, 0.015);
        assertThat(v[0]).isNegative();
        assertThat(v[1]).isNegative();
        assertThat(v[1] / v[0]).isBetween(0.3, 3.0);
        // settling over the Sun's age moves helium by a small fraction of a pressure scale height (the
        // envelope's helium falls by a few per cent, Bahcall & Pinsonneault 1995: ~0.03 in Y): 1e-10 to 1e-8 cm/s
        assertThat(-v[0]).isBetween(1e-10, 1e-8);
        assertThat(v[2]).isPositive();
    }

    @Test
    void resistanceIsSymmetricAndScalesWithDensitiesAndTemperature() {
        double kt = Constants.K_B * T;
        double a = GravitationalSettling.resistance(1, 1, 4, 2, 1e23, 1e22, kt, 2e-8);
        assertThat(GravitationalSettling.resistance(4, 2, 1, 1, 1e22, 1e23, kt, 2e-8)).isCloseTo(a,
                within(1e-14 * a));
        assertThat(GravitationalSettling.resistance(1, 1, 4, 2, 2e23, 1e22, kt, 2e-8)).isCloseTo(2 * a,
                within(1e-12 * a));
        // Coulomb logarithm at the solar envelope base: ~3-4 with the Debye length of these densities
        double lnLambda = Math.log(2 * kt * 2.2e-8 / (2 * Constants.E_CHARGE * Constants.E_CHARGE));
        assertThat(lnLambda).isBetween(2.5, 5.0);
        // weakly coupled plasma floor: never below ln Lambda = 1
        double cold = GravitationalSettling.resistance(1, 1, 4, 2, 1e23, 1e22, kt, 1e-12);
        double unitLog = 4.0 / 3.0 * Math.sqrt(2 * Math.PI * 0.8 * Constants.M_U) * 1e23 * 1e22
                * Math.pow(2 * Constants.E_CHARGE * Constants.E_CHARGE, 2) / Math.pow(kt, 1.5);
        assertThat(cold).isCloseTo(unitLog, within(1e-9 * unitLog));
    }
}
