package org.convgrid.engine.physics.eos;

import org.convgrid.engine.state.Composition;
import org.convgrid.engine.state.Element;
import org.convgrid.engine.state.MetalMixture;
import org.convgrid.engine.units.Constants;

/**
 * Per-mixture bookkeeping of nuclei: moles per gram times m_u, i.e. particles per atomic mass
 * unit, of every element the EOS follows. Carbon, nitrogen and oxygen come from their own mass fractions, every
 * other metal from {@code otherMetals} in the proportions of the mixture.
 */
final class Nuclides {

    /** Atomic mass of 3He in u (AME 2020, from memory; only enters through 3He/A). */
    static final double MASS_HE3_AMU = 3.016029322;
    /** 12C by definition; 14N and 16O atomic masses (AME 2020, from memory). */
    static final double MASS_C12_AMU = 12.0;
    static final double MASS_N14_AMU = 14.003074004;
    static final double MASS_O16_AMU = 15.994914620;

    private final Element[] others;
    /** Particles per u of each "other" metal per unit otherMetals mass fraction. */
    private final double[] otherWeights;

    Nuclides(MetalMixture mixture) {
        double cno = mixture.massFractionOfZ("C") + mixture.massFractionOfZ("N") + mixture.massFractionOfZ("O");
        var rest = mixture.elements().stream()
                .filter(e -> !e.symbol().equals("C") && !e.symbol().equals("N") && !e.symbol().equals("O"))
                .toList();
        others = rest.toArray(new Element[0]);
        otherWeights = new double[others.length];
        for (int i = 0; i < others.length; i++) {
            otherWeights[i] = mixture.massFractionOfZ(others[i].symbol()) / (1.0 - cno) / others[i].massAmu();
        }
    }

    int otherCount() {
        return others.length;
    }

    Element other(int i) {
        return others[i];
    }

    /** Particles per u of other metal {@code i} in this composition. */
    double otherAbundance(int i, Composition c) {
        return otherWeights[i] * c.otherMetals();
    }

    static double hydrogen(Composition c) {
        return c.h1() / Constants.MASS_H1_AMU;
    }

    static double helium(Composition c) {
        return c.he3() / MASS_HE3_AMU + c.he4() / Constants.MASS_HE4_AMU;
    }

    /** Nuclei per atomic mass unit, sum X_i/A_i. */
    double nuclei(Composition c) {
        double y = hydrogen(c) + helium(c) + c.c12() / MASS_C12_AMU + c.n14() / MASS_N14_AMU
                + c.o16() / MASS_O16_AMU;
        for (int i = 0; i < others.length; i++) {
            y += otherAbundance(i, c);
        }
        return y;
    }

    /** Electrons per atomic mass unit at full ionisation, sum Z_i X_i/A_i. */
    double electronsFullyIonised(Composition c) {
        double y = hydrogen(c) + 2.0 * helium(c) + 6.0 * c.c12() / MASS_C12_AMU + 7.0 * c.n14() / MASS_N14_AMU
                + 8.0 * c.o16() / MASS_O16_AMU;
        for (int i = 0; i < others.length; i++) {
            y += others[i].charge() * otherAbundance(i, c);
        }
        return y;
    }
}
