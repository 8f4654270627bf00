package org.convgrid.engine.physics.opacity;

import static org.assertj.core.api.Assertions.assertThat;

import org.convgrid.engine.state.Composition;
import org.junit.jupiter.api.Test;

/**
 * {@link OpalGn93Opacity#source}: which shipped table file and which of its Z tables answered, for {@code probe}.
 * The regions are the class's own: the low-temperature tables of Ferguson et al. 2005 (ApJ 623, 585) alone up to
 * log T 3.80, blended with the OPAL tables of Iglesias &amp; Rogers 1996 (ApJ 464, 943) to 4.00 (our choice of
 * overlap), the analytic terms beyond both.
 */
class OpacitySourceTest {

    private static final OpalGn93Opacity OPACITY = OpalGn93Opacity.shipped();
    private static final Composition SOLAR_LIKE = Composition.scaledSolar(0.7, 0.02);

    private static String at(double density, double temperature, Composition composition) {
        return OPACITY.source(density, temperature, composition);
    }

    @Test
    void aTabulatedZIsReadFromItsOwnTablesAlone() {
        assertThat(at(1e-12, 3e4, SOLAR_LIKE)).isEqualTo("opal-gn93hz.txt at Z 0.02");
        assertThat(at(1e-7, 5000, SOLAR_LIKE)).isEqualTo("ferguson-gn93-cool.txt at Z 0.02");
    }

    @Test
    void aZBetweenTablesNamesTheRowsItWeighsAndTheZItWasInterpolatedTo() {
        assertThat(at(1e-12, 3e4, Composition.scaledSolar(0.7, 0.014)))
                .isEqualTo("opal-gn93hz.txt at Z 0.004/0.01/0.02/0.03 (interpolated to Z 0.014)");
    }

    @Test
    void theOverlapNamesBothSetsWithTheLowTemperatureWeight() {
        // log T 3.903: u = 0.515 of the overlap, weight 1 - 3u^2 + 2u^3 = 0.48
        assertThat(at(1e-7, 8000, SOLAR_LIKE)).isEqualTo(
                "ferguson-gn93-cool.txt at Z 0.02 (weight 0.48) blended with opal-gn93hz.txt at Z 0.02");
    }

    @Test
    void beyondTheTablesTheAnalyticTermsAreNamed() {
        // log T 3.18, below the low-temperature set's coolest row (3.30) and its 0.05 dex fade
        assertThat(at(1e-8, 1500, SOLAR_LIKE)).isEqualTo("analytic terms");
        // log T 3.30, log R 4.6: above the set's log R +1, where its offset is held
        assertThat(at(1.0, 2000, SOLAR_LIKE)).isEqualTo("analytic terms joined to ferguson-gn93-cool.txt at Z 0.02");
    }
}
