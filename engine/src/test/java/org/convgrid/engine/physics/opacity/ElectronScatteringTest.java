package org.convgrid.engine.physics.opacity;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.convgrid.engine.state.Composition;
import org.junit.jupiter.api.Test;

class ElectronScatteringTest extends OpacityContractTest {

    private final ElectronScattering es = new ElectronScattering();

    @Override
    Opacity opacity() {
        return es;
    }

    @Test
    void hotDiluteLimitIsThomson() {
        // Carroll & Ostlie 1996, p. 274: kappa_es = 0.2 (1+X); exact sigma_T/(2 m_u) = 0.20031 (derived,
        // CODATA 2018). At T = 1e6 K, rho = 1e-6 both correction factors differ from 1 by < 0.3 %.
        for (double x : new double[] {0.0, 0.35, 0.7, 1.0}) {
            double k = es.rosselandMean(1e-6, 1e6, Composition.scaledSolar(x, 0.0)).kappa();
            assertThat(k).isCloseTo(0.2 * (1 + x), within(0.004 * 0.2 * (1 + x)));
        }
        assertThat(ElectronScattering.THOMSON_PER_ONE_PLUS_X).isCloseTo(0.20031, within(1e-5));
    }

    @Test
    void degeneracyFactorReducesSolarCentreByFourteenPercent() {
        // Derived from the Buchler & Yueh 1976 fit (coefficients from memory): 14 % reduction at T = 1.57e7, rho = 150,
        // the Compton factor takes off another ~5 % (1/(1 + (T/4.5e8)^0.86) = 0.947), total ~0.81.
        Composition c = Composition.scaledSolar(0.35, 0.02);
        double k = es.rosselandMean(150, 1.57e7, c).kappa();
        double thomson = ElectronScattering.THOMSON_PER_ONE_PLUS_X * 1.35;
        double degeneracyOnly = 1.0 / (1.0 + 2.7e11 * 150 / (1.57e7 * 1.57e7));
        assertThat(degeneracyOnly).isCloseTo(0.86, within(0.005));
        assertThat(k / thomson).isBetween(0.80, 0.86);
    }

    @Test
    void comptonFactorReducesByAboutTwentyPercentAt1e8K() {
        // Buchler & Yueh 1976 (ApJ 210, 440) Compton factor [1 + (T/4.5e8)^0.86]^-1: ~21 % reduction at 1e8 K
        // (derived from the fit as commonly quoted; the coefficients are from memory).
        double k = es.rosselandMean(1e-3, 1e8, Composition.scaledSolar(0.7, 0.02)).kappa();
        assertThat(k / (ElectronScattering.THOMSON_PER_ONE_PLUS_X * 1.7)).isCloseTo(0.79, within(0.01));
    }
}
