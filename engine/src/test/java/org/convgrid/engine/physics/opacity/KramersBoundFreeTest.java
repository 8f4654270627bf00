package org.convgrid.engine.physics.opacity;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.convgrid.engine.state.Composition;
import org.junit.jupiter.api.Test;

class KramersBoundFreeTest extends OpacityContractTest {

    @Override
    Opacity opacity() {
        return new KramersBoundFree();
    }

    @Test
    void constantGuillotineReproducesCarrollAndOstlieCoefficient() {
        // Carroll & Ostlie 1996, p. 274: kappa_bf = 4.34e25 (g_bf/t) Z (1+X) rho T^-3.5;
        // slope 0 makes t = 2^(1/s) constant, here s = 50 so t = 1.0140.
        KramersBoundFree plain = new KramersBoundFree(1e7, 0.0, 50.0);
        double k = plain.rosselandMean(1.0, 1e6, Composition.scaledSolar(0.7, 0.02)).kappa();
        assertThat(k * Math.pow(2.0, 1.0 / 50.0)).isCloseTo(4.34e25 * 0.02 * 1.7 * 1e-21, within(1e-9 * k));
    }

    @Test
    void guillotineIsOneBelowTheKneeAndGrowsAboveIt() {
        // Derived from Carroll & Ostlie 1996, p. 274 (tabulated kappa from memory): t ~ 1 suits the CZ base
        // (T = 2.2e6, rho = 0.19), t ~ 20 the solar centre (T = 1.57e7, rho = 150). The fitted knee now moves with
        // density, so the checks use those densities.
        KramersBoundFree bf = new KramersBoundFree();
        assertThat(bf.guillotine(0.19, 2.2e6)).isBetween(1.0, 1.1);
        assertThat(bf.guillotine(150, 1.57e7)).isBetween(15.0, 30.0);
        assertThat(bf.guillotine(1e-6, 1e5)).isCloseTo(1.0, within(1e-6));
    }

    @Test
    void denserGasStripsLaterSoTheGuillotineFallsWithDensityAtFixedTemperature() {
        // OPAL (Iglesias & Rogers 1996, GN93 X = 0.70, Z = 0.02; reference/opacity/opal-gn93-x070-z002.txt): at
        // log T = 6.7, kappa grows by only 0.37 dex from log R = -2 to -1 (log kappa 0.558 -> 0.931), less than the
        // full decade a rho-linear Kramers law gives; the fitted guillotine supplies the missing density dependence.
        KramersBoundFree bf = new KramersBoundFree();
        double t = Math.pow(10.0, 6.7);
        double rhoLow = 1e-2 * Math.pow(t * 1e-6, 3);
        assertThat(bf.guillotine(10.0 * rhoLow, t)).isGreaterThan(bf.guillotine(rhoLow, t));
        KramersBoundFree blind = new KramersBoundFree(2e6, 1.5, 0.0, 11.0);
        assertThat(blind.guillotine(10.0 * rhoLow, t)).isCloseTo(blind.guillotine(rhoLow, t), within(1e-12));
    }
}
