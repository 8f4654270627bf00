package org.convgrid.engine.evolution;

import org.convgrid.engine.state.Composition;

/**
 * Conversion between {@link Composition} and a plain array of its nine mass fractions, in the order 1H, 3He,
 * 4He, 12C, 14N, 16O, other metals, deuterium, 7Li (the first {@link #BURNING} are changed by the hydrogen-burning
 * network; deuterium and 7Li, appended so the older indices keep their meaning, by {@link LightElementBurning}).
 */
final class MassFractions {

    /** Number of species changed by hydrogen burning. */
    static final int BURNING = 6;
    /** Number of entries including the other metals. */
    static final int ALL = 9;
    /** Index of the other metals. */
    static final int OTHER_METALS = 6;
    /** Index of deuterium. */
    static final int H2 = 7;
    /** Index of 7Li. */
    static final int LI7 = 8;

    private MassFractions() {
    }

    static double[] of(Composition c) {
        return new double[] {c.h1(), c.he3(), c.he4(), c.c12(), c.n14(), c.o16(), c.otherMetals(), c.h2(), c.li7()};
    }

    /** sum += weight x(c), element by element in the order of {@link #of}, without the array of {@link #of}. */
    static void addWeighted(double[] sum, double weight, Composition c) {
        sum[0] += weight * c.h1();
        sum[1] += weight * c.he3();
        sum[2] += weight * c.he4();
        sum[3] += weight * c.c12();
        sum[4] += weight * c.n14();
        sum[5] += weight * c.o16();
        sum[6] += weight * c.otherMetals();
        sum[H2] += weight * c.h2();
        sum[LI7] += weight * c.li7();
    }

    static Composition composition(double[] x) {
        return new Composition(x[0], x[1], x[2], x[3], x[4], x[5], x[6], x[7], x[8]);
    }
}
