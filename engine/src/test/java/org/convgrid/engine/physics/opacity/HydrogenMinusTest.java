package org.convgrid.engine.physics.opacity;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.convgrid.engine.state.Composition;
import org.junit.jupiter.api.Test;

class HydrogenMinusTest extends OpacityContractTest {

    @Override
    Opacity opacity() {
        return new HydrogenMinus();
    }

    @Test
    void reproducesThePowerLawAndItsMetallicityScaling() {
        // Hansen, Kawaler & Trimble 2004, ch. 4 / Carroll & Ostlie 2007 ch. 9 (from memory):
        // 2.5e-31 (Z/0.02) rho^0.5 T^9; at T = 5000, rho = 1e-7: 2.5e-31 * 3.162e-4 * 1.953e33 = 0.154.
        HydrogenMinus law = HydrogenMinus.hansenKawalerTrimble();
        double k = law.rosselandMean(1e-7, 5000, Composition.scaledSolar(0.7, 0.02)).kappa();
        assertThat(k).isCloseTo(0.154, within(0.002));
        double kLowZ = law.rosselandMean(1e-7, 5000, Composition.scaledSolar(0.7, 0.002)).kappa();
        assertThat(kLowZ / k).isCloseTo(0.1, within(1e-12));
        assertThat(new HydrogenMinus().rosselandMean(1e-7, 5000, Composition.scaledSolar(0.7, 0.0)).kappa())
                .isPositive();
    }

    @Test
    void fittedLawIsBelowTheTextbookLawAtTheSolarPhotosphere() {
        // The textbook law, inside the composite, is ~3x the OPAL value near the solar photosphere (Iglesias &
        // Rogers 1996, GN93 X = 0.70, Z = 0.02: log kappa = -0.645 at log T = 3.75, log R = 0 and -0.180 at 3.80;
        // reference/opacity/opal-gn93-x070-z002.txt). The fitted law must sit well below it there, and both share
        // the Z scaling.
        Composition sun = Composition.scaledSolar(0.7, 0.02);
        double fitted = new HydrogenMinus().rosselandMean(2.18e-7, 5772, sun).kappa();
        double textbook = HydrogenMinus.hansenKawalerTrimble().rosselandMean(2.18e-7, 5772, sun).kappa();
        assertThat(fitted / textbook).isBetween(0.15, 0.6);
    }
}
