package org.convgrid.output;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.junit.jupiter.api.Test;

/**
 * The {@code fe_h_dex} cell: [Fe/H] = log10((Z/X) / (Z/X)_sun), X = 1 - Y - Z, for a solar-scaled mixture (common
 * practice, no single published source; the default (Z/X)_sun 0.0245 is Grevesse &amp; Noels 1993's present solar
 * surface value, the opacity tables' mixture).
 */
class IronAbundanceTest {

    @Test
    void theSunsOwnRatioIsZeroAndTenTimesItIsOneDex() {
        // Z = 0.0245 X with Y = 0.27: X = 0.73 / 1.0245
        double x = 0.73 / 1.0245;
        assertThat(IronAbundance.DEFAULT.cell(0.0245 * x, 0.27)).isEqualTo("0.0");
        double richX = 0.73 / 1.245;
        assertThat(IronAbundance.DEFAULT.cell(0.245 * richX, 0.27)).isEqualTo("1.0");
    }

    @Test
    void cellsAreRoundedToFourDecimalsInTheTablesRealStyle() {
        // log10(0.02 / 0.70 / 0.0245) = 0.066766
        assertThat(IronAbundance.DEFAULT.cell(0.02, 0.28)).isEqualTo("0.0668");
        // log10(0.008 / 0.7329 / 0.0245) = -0.351121 (the demo's metal-poor members)
        assertThat(IronAbundance.DEFAULT.cell(0.008, 0.2591)).isEqualTo("-0.3511");
        assertThat(new IronAbundance(0.0181, false).cell(0.02, 0.28)).isEqualTo("0.1983");
    }

    @Test
    void noMetalsOrAnUnknownCompositionHasNoIron() {
        assertThat(IronAbundance.DEFAULT.cell(0.0, 0.2471)).isEmpty();
        assertThat(IronAbundance.DEFAULT.dex(Double.NaN, 0.27)).isNaN();
        assertThat(IronAbundance.DEFAULT.dex(0.02, Double.NaN)).isNaN();
        // no hydrogen left (an edited cell, or Y + Z above 1 after rounding): no [Fe/H], not an exception
        assertThat(IronAbundance.DEFAULT.dex(0.02, 0.99)).isNaN();
        assertThat(IronAbundance.DEFAULT.cell(0.3, 0.8)).isEmpty();
    }

    @Test
    void aValueRoundingToZeroIsWrittenWithoutSign() {
        // a hair below the Sun's ratio rounds to -0.0 in binary; the cell says 0.0
        double x = 0.73 / 1.0245;
        assertThat(IronAbundance.DEFAULT.dex(0.0245 * x * 0.99999, 0.27)).isEqualTo(0.0);
        assertThat(IronAbundance.DEFAULT.cell(0.0245 * x * 0.99999, 0.27)).isEqualTo("0.0");
    }

    @Test
    void theColumnDescriptionNamesTheSun() {
        assertThat(new IronAbundance(0.0181, true).columnDescription())
                .startsWith("[Fe/H] = log10 of (Z/X) over the solar Z/X 0.0181 (solar-scaled mixture)");
        assertThatThrownBy(() -> new IronAbundance(0.0, true)).isInstanceOf(IllegalArgumentException.class);
    }
}
