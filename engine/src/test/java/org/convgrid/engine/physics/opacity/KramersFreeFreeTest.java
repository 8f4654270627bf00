package org.convgrid.engine.physics.opacity;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.convgrid.engine.state.Composition;
import org.junit.jupiter.api.Test;

class KramersFreeFreeTest extends OpacityContractTest {

    @Override
    Opacity opacity() {
        return new KramersFreeFree();
    }

    @Test
    void metalFreeGasReproducesCarrollAndOstlieCoefficient() {
        // Carroll & Ostlie 1996, p. 274: kappa_ff = 3.68e22 g_ff (1 - Z)(1 + X) rho T^-3.5.
        Composition c = Composition.scaledSolar(0.7, 0.0);
        double k = new KramersFreeFree().rosselandMean(1.0, 1e6, c).kappa();
        assertThat(k).isCloseTo(3.68e22 * 1.0 * 1.7 * 1e-21, within(1e-12 * k));
        double k2 = new KramersFreeFree(1.2).rosselandMean(1.0, 1e6, c).kappa();
        assertThat(k2 / k).isCloseTo(1.2, within(1e-12));
    }

    @Test
    void metalIonsAddTheirChargeSquared() {
        // Kippenhahn, Weigert & Weiss 2012 (opacity chapter): factor (X + Y + B), B = sum X_j Z_j^2/A_j; for
        // solar-like metals Z_j^2/A_j ~ 4-6 (O: 4, Fe: 12), so B/Z lies between 3 and 7 (derived).
        Composition c = Composition.scaledSolar(0.7, 0.02);
        double b = PlasmaMoments.metalChargeSquared(c);
        assertThat(b / 0.02).isBetween(3.0, 7.0);
        double k = new KramersFreeFree().rosselandMean(1.0, 1e6, c).kappa();
        assertThat(k).isCloseTo(3.68e22 * 1.7 * (0.98 + b) * 1e-21, within(1e-12 * k));
    }
}
