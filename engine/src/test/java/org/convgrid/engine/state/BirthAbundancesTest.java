package org.convgrid.engine.state;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

class BirthAbundancesTest {

    @Test
    void protosolarRatiosAndTotals() {
        Composition c = BirthAbundances.of(0.70, 0.02);
        // X and Z as asked: deuterium counts as hydrogen, 7Li as a metal
        assertThat(c.x()).isCloseTo(0.70, within(1.0e-15));
        assertThat(c.z()).isCloseTo(0.02, within(1.0e-15));
        // D/H = 2.0e-5 by number (Geiss & Gloeckler 1998, protosolar; from memory): X_D/X_H = 2.0e-5 m_D/m_H
        assertThat(c.h2() / c.h1()).isCloseTo(2.0e-5 * 2.0141 / 1.00783, within(1.0e-12));
        // A(Li) = 3.26 meteoritic (Asplund et al. 2009, Table 1), 92.4 % 7Li (Lodders 2003; from memory)
        double aLi = Math.log10(c.li7() / 7.0160 * 1.00783 / c.h1() / 0.924) + 12.0;
        assertThat(aLi).isCloseTo(3.26, within(1.0e-9));
        // 3He/4He = 1.66e-4 by number (Geiss & Gloeckler 1998; from memory)
        assertThat(c.he3() / c.he4() * 4.0026 / 3.0160).isCloseTo(1.66e-4, within(1.0e-12));
        // C, N, O in the mixture's proportions, not CN-processed
        Composition bare = Composition.scaledSolar(0.70, 0.02);
        assertThat(c.c12()).isEqualTo(bare.c12());
        assertThat(c.n14()).isEqualTo(bare.n14());
    }

    @Test
    void withTraceSpeciesKeepsTheSum() {
        Composition c = BirthAbundances.of(0.70, 0.02).withTraceSpecies(0.0, 0.0);
        assertThat(c.h2()).isZero();
        assertThat(c.x()).isCloseTo(0.70, within(1.0e-15));
        assertThat(c.z()).isCloseTo(0.02, within(1.0e-15));
    }
}
