package org.convgrid.engine.state;

/**
 * The composition a star is born with: hydrogen X and metals Z as given (metals in a scaled-solar mixture), and
 * the fragile species at their protosolar abundances, not at any burning equilibrium, so that their destruction
 * on the pre-main sequence comes from the evolution itself.
 *
 * <ul>
 *   <li>Deuterium: D/H = 2.0e-5 by number, the protosolar value from the 3He of the solar wind (Geiss &amp;
 *   Gloeckler 1998, Space Sci. Rev. 84, 239; from memory), not scaled with Z (deuterium is only destroyed since
 *   the Big Bang; the local interstellar value, 1.5e-5, Linsky 1998, Space Sci. Rev. 84, 285, is close).</li>
 *   <li>7Li: the meteoritic A(Li) = log(N_Li/N_H) + 12 = 3.26 (Asplund et al. 2009, ARA&amp;A 47, 481, Table 1),
 *   of which 92.4 % is 7Li (Lodders 2003, ApJ 591, 1220; from memory). The same at every Z, not scaled: the
 *   engine reports lithium relative to its initial value, which that choice leaves unchanged (7Li is far too rare
 *   to feed back on the structure).</li>
 *   <li>3He: 3He/4He = 1.66e-4 by number, protosolar (Geiss &amp; Gloeckler 1998; from memory), not scaled with Z.</li>
 *   <li>C, N, O: the mixture's proportions of Z ({@link Composition#scaled}), not CN-cycle equilibrium.</li>
 * </ul>
 */
public final class BirthAbundances {

    /** Protosolar D/H, by number. */
    public static final double DEUTERIUM_PER_HYDROGEN = 2.0e-5;
    /** Meteoritic A(Li) = log10(N_Li/N_H) + 12. */
    public static final double LITHIUM_LOG_ABUNDANCE = 3.26;
    /** Fraction of lithium nuclei that are 7Li. */
    public static final double LITHIUM7_FRACTION = 0.924;
    /** Protosolar 3He/4He, by number. */
    public static final double HELIUM3_PER_HELIUM4 = 1.66e-4;

    private static final double MASS_RATIO_D_H = 2.0141 / 1.00783;
    private static final double MASS_RATIO_LI7_H = 7.0160 / 1.00783;
    private static final double MASS_RATIO_HE3_HE4 = 3.0160 / 4.0026;

    private BirthAbundances() {
    }

    /**
     * @param x hydrogen mass fraction X (1H and deuterium together)
     * @param z metal mass fraction Z (7Li included)
     * @return the birth composition, helium 1 - X - Z (3He and 4He together)
     */
    public static Composition of(double x, double z) {
        return of(x, z, MetalMixture.GS98);
    }

    /** The birth composition with the metals in {@code mixture}. */
    public static Composition of(double x, double z, MetalMixture mixture) {
        Composition bare = Composition.scaled(x, z, mixture);
        // number ratios to mass fractions: X_i / X_H = (N_i/N_H) (m_i/m_H), X_H the 1H that remains
        double dOverH = DEUTERIUM_PER_HYDROGEN * MASS_RATIO_D_H;
        double h1 = bare.h1() / (1.0 + dOverH);
        double h2 = bare.h1() - h1;
        double li7 = Math.min(bare.otherMetals(),
                h1 * Math.pow(10.0, LITHIUM_LOG_ABUNDANCE - 12.0) * LITHIUM7_FRACTION * MASS_RATIO_LI7_H);
        double he3Over4 = HELIUM3_PER_HELIUM4 * MASS_RATIO_HE3_HE4;
        double he4 = bare.he4() / (1.0 + he3Over4);
        double he3 = bare.he4() - he4;
        return new Composition(h1, he3, he4, bare.c12(), bare.n14(), bare.o16(), bare.otherMetals() - li7, h2, li7);
    }
}
