package org.convgrid.engine.structure;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.convgrid.engine.convection.LedouxGradient;
import org.junit.jupiter.api.Test;

/**
 * The formula N^2 = (g^2 rho / P) (chi_T / chi_rho) (nabla_ad - nabla + B) at synthetic points (Unno et al. 1989,
 * "Nonradial Oscillations of Stars", 2nd ed.; Aerts, Christensen-Dalsgaard &amp; Kurtz 2010, "Asteroseismology",
 * ch. 3; both from memory, equation numbers not checked). Solved models: BuoyancyFrequencyOfSolvedStarsTest.
 */
class BuoyancyFrequencyTest {

    // a point of the Sun's radiative interior, roughly (illustrative, not computed): g, rho, P in cgs
    private static final double GRAVITY = 2.0e5;
    private static final double DENSITY = 20.0;
    private static final double PRESSURE = 3.0e16;

    @Test
    void anIdealGasOfUniformCompositionGivesTheSuperadiabaticityTerm() {
        // chi_T = chi_rho = 1, B = 0: N^2 = (g^2 rho / P) (nabla_ad - nabla)
        double n2 = BuoyancyFrequency.squared(GRAVITY, DENSITY, PRESSURE, 1.0, 1.0, 0.4, 0.25, 0.0);
        double expected = GRAVITY * GRAVITY * DENSITY / PRESSURE * (0.4 - 0.25);
        assertThat(n2).isCloseTo(expected, within(1e-14 * expected));
        assertThat(n2).isCloseTo(4.0e-6, within(1e-18));
    }

    @Test
    void anIdealGasWithRadiationReducesToTheNablaMuForm() {
        // ideal gas + radiation: chi_rho = beta, chi_T = 4 - 3 beta, phi = 1 (Kippenhahn, Weigert & Weiss 2012,
        // ch. 6), so N^2 = (g^2 rho / P) (delta (nabla_ad - nabla) + nabla_mu) with delta = chi_T / chi_rho
        double beta = 0.9;
        double chiRho = beta;
        double chiT = 4.0 - 3.0 * beta;
        double delta = chiT / chiRho;
        double nablaAd = 0.38;
        double nabla = 0.30;
        double nablaMu = 0.05;
        double b = LedouxGradient.compositionTerm(1.0, delta, nablaMu);
        double n2 = BuoyancyFrequency.squared(GRAVITY, DENSITY, PRESSURE, chiT, chiRho, nablaAd, nabla, b);
        double expected = GRAVITY * GRAVITY * DENSITY / PRESSURE * (delta * (nablaAd - nabla) + nablaMu);
        assertThat(n2).isCloseTo(expected, within(1e-13 * expected));
        // the composition term adds g^2 rho / P nabla_mu, whatever the gas pressure fraction
        double withoutMu = BuoyancyFrequency.squared(GRAVITY, DENSITY, PRESSURE, chiT, chiRho, nablaAd, nabla, 0.0);
        assertThat(n2 - withoutMu).isCloseTo(GRAVITY * GRAVITY * DENSITY / PRESSURE * nablaMu,
                within(1e-12 * n2));
    }

    @Test
    void aSuperadiabaticLayerGetsANegativeValueNotZero() {
        // convective instability is N^2 < 0 (Unno et al. 1989, from memory); the value is written, not clamped
        assertThat(BuoyancyFrequency.squared(GRAVITY, DENSITY, PRESSURE, 1.0, 1.0, 0.4, 0.4, 0.0)).isZero();
        assertThat(BuoyancyFrequency.squared(GRAVITY, DENSITY, PRESSURE, 1.0, 1.0, 0.4, 0.41, 0.0)).isNegative();
        // a composition gradient can hold a Schwarzschild-unstable layer stable (Ledoux 1947, ApJ 105, 305)
        assertThat(BuoyancyFrequency.squared(GRAVITY, DENSITY, PRESSURE, 1.0, 1.0, 0.4, 0.41, 0.02)).isPositive();
    }
}
