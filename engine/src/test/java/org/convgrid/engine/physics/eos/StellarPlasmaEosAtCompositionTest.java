package org.convgrid.engine.physics.eos;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.convgrid.engine.error.ConvgridException;
import org.convgrid.engine.state.Composition;
import org.junit.jupiter.api.Test;

/**
 * {@link StellarPlasmaEos#atComposition} only prepares the composition's constants once: its states are the very
 * states of {@link StellarPlasmaEos#atDensity} (cold start without a nearby state, the nearby start with one),
 * bit for bit, so a structure solve gives the same digits either way. A property of our code, not physics: no
 * published values are involved.
 */
class StellarPlasmaEosAtCompositionTest {

    private static final StellarPlasmaEos EOS = new StellarPlasmaEos();

    /** rho (g cm^-3), T (K), X: solar centre, base of the convection zone, He ionisation, photosphere, H2 region. */
    private static final double[][] POINTS = {
        {152.9, 1.567e7, 0.346}, {0.19, 2.2e6, 0.7}, {3.0e-5, 1.0e5, 0.7}, {2.0e-7, 5800.0, 0.7},
        {1.0e-6, 3000.0, 0.7},
    };

    @Test
    void givesTheStatesOfAtDensityBitForBit() {
        EosState far = EOS.atDensity(152.9, 1.567e7, Composition.scaledSolar(0.346, 0.0188));
        for (double[] p : POINTS) {
            Composition c = Composition.scaledSolar(p[2], 0.0188);
            EosAtComposition fixed = EOS.atComposition(c);
            // another composition in between: the handle keeps its own constants
            EOS.atDensity(p[0], p[1], Composition.scaledSolar(0.5, 0.04));
            assertThat(fixed.atDensity(p[0], p[1], null)).isEqualTo(EOS.atDensity(p[0], p[1], c));
            EosState near = EOS.atDensity(p[0] * 1.01, p[1], c);
            assertThat(fixed.atDensity(p[0], p[1], near)).isEqualTo(EOS.atDensity(p[0], p[1], c, near));
            assertThat(fixed.atDensity(p[0], p[1], far)).isEqualTo(EOS.atDensity(p[0], p[1], c, far));
        }
    }

    @Test
    void checksTheDomainAsAtDensityDoes() {
        EosAtComposition fixed = EOS.atComposition(Composition.scaledSolar(0.7, 0.02));
        assertThatThrownBy(() -> fixed.atDensity(-1.0, 1.0e6, null)).isInstanceOf(ConvgridException.class);
        assertThatThrownBy(() -> fixed.atDensity(1.0, Double.NaN, null)).isInstanceOf(ConvgridException.class);
    }
}
