package org.convgrid.engine.calibration;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

/**
 * [Fe/H] and Z of a solar-scaled mixture, Z/X = (Z/X)_sun 10^[Fe/H] with X = 1 - Y - Z (common practice, no single
 * published source), against the present solar surface Z/X of Grevesse &amp; Noels (1993), 0.0245: the two directions
 * invert each other, and the law-of-enrichment form agrees with the fixed-helium one at the helium it implies.
 */
class SolarScaledMetallicityTest {

    private final SolarScaledMetallicity gn93 = SolarScaledMetallicity.GN93;

    @Test
    void solarIronGivesTheSolarRatio() {
        double z = gn93.metals(0.0, 0.27);
        assertThat(z / (1.0 - 0.27 - z)).isCloseTo(0.0245, within(1e-15));
        assertThat(gn93.ironDex(z, 0.27)).isCloseTo(0.0, within(1e-14));
    }

    @Test
    void bothDirectionsInvertEachOther() {
        for (double iron : new double[] {-2.0, -0.5, 0.0, 0.3}) {
            assertThat(gn93.ironDex(gn93.metals(iron, 0.26), 0.26)).isCloseTo(iron, within(1e-12));
            double z = gn93.metals(iron, 0.2471, 1.5);
            assertThat(gn93.metals(iron, 0.2471 + 1.5 * z)).isCloseTo(z, within(1e-15));
            assertThat(gn93.ironDex(z, 0.2471 + 1.5 * z)).isCloseTo(iron, within(1e-12));
        }
    }

    @Test
    void refusesAReferenceThatIsNotPositive() {
        assertThatThrownBy(() -> new SolarScaledMetallicity(0.0)).isInstanceOf(IllegalArgumentException.class)
                .hasMessage("the solar Z/X must be positive, got 0.0");
        assertThatThrownBy(() -> new SolarScaledMetallicity(Double.NaN)).isInstanceOf(IllegalArgumentException.class);
    }
}
