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
        // Hansen, Kawaler & Trimble 2004, ch. 4 / Carroll & Ostlie 2007 ch. 9 (check-values 7c, M):
        // 2.5e-31 (Z/0.02) rho^0.5 T^9; at T = 5000, rho = 1e-7: 2.5e-31 * 3.162e-4 * 1.953e33 = 0.154.
        double k = new HydrogenMinus().rosselandMean(1e-7, 5000, Composition.scaledSolar(0.7, 0.02)).kappa();
        assertThat(k).isCloseTo(0.154, within(0.002));
        double kLowZ = new HydrogenMinus().rosselandMean(1e-7, 5000, Composition.scaledSolar(0.7, 0.002)).kappa();
        assertThat(kLowZ / k).isCloseTo(0.1, within(1e-12));
        assertThat(new HydrogenMinus().rosselandMean(1e-7, 5000, Composition.scaledSolar(0.7, 0.0)).kappa())
                .isPositive();
    }
}
