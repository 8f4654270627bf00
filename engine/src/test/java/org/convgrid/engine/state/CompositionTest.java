package org.convgrid.engine.state;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.convgrid.engine.error.ConvgridException;
import org.convgrid.engine.error.ErrorKind;
import org.junit.jupiter.api.Test;

class CompositionTest {

    @Test
    void gs98MixtureReproducesItsPublishedMetalToHydrogenRatio() {
        // Present-day photospheric Z/X = 0.0231 for Grevesse & Sauval 1998 (Asplund, Amarsi & Grevesse 2021,
        // A&A 653, A141, Table 4). Our log-abundances are from memory, so this check is what validates them.
        assertThat(MetalMixture.GS98.metalToHydrogenMassRatio()).isCloseTo(0.0231, within(0.0007));
    }

    @Test
    void carbonNitrogenOxygenAreAboutTwoThirdsOfTheMetals() {
        // C+N+O ~70 % of Z by mass, O about half (from memory; loose tolerance).
        Composition c = Composition.scaledSolar(0.70, 0.02);
        assertThat(c.cno() / c.z()).isBetween(0.6, 0.8);
        assertThat(c.o16() / c.z()).isBetween(0.4, 0.55);
    }

    @Test
    void scaledSolarKeepsXYZ() {
        Composition c = Composition.scaledSolar(0.7, 0.02);
        assertThat(c.x()).isEqualTo(0.7);
        assertThat(c.z()).isCloseTo(0.02, within(1e-15));
        assertThat(c.y()).isCloseTo(0.28, within(1e-15));
    }

    @Test
    void rejectsImpossibleFractions() {
        assertThatThrownBy(() -> Composition.scaledSolar(0.95, 0.1))
                .isInstanceOfSatisfying(ConvgridException.class, e -> assertThat(e.kind()).isEqualTo(ErrorKind.BAD_COMPOSITION));
        assertThatThrownBy(() -> Composition.scaledSolar(-0.1, 0.02)).isInstanceOf(ConvgridException.class);
    }
}
