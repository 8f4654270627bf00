package org.convgrid.engine.physics.opacity;

import org.convgrid.engine.state.Composition;
import org.convgrid.engine.state.Element;
import org.convgrid.engine.state.MetalMixture;

/**
 * Charge moments of a fully ionized mixture, per atomic mass unit of matter, shared by the opacity terms.
 * Hydrogen and helium are counted with A = 1 and A = 4 (the textbook convention behind 0.2(1+X)); carbon,
 * nitrogen and oxygen with their own charges; the other metals with the mean Z/A and Z^2/A of the
 * Grevesse &amp; Sauval 1998 mixture without C, N and O (the {@link Composition} default).
 */
final class PlasmaMoments {

    /** Mean Z/A of the non-CNO metals of the default mixture. */
    private static final double OTHER_Z_OVER_A;
    /** Mean Z^2/A of the non-CNO metals of the default mixture. */
    private static final double OTHER_Z2_OVER_A;
    /** Mean 1/A of the non-CNO metals of the default mixture. */
    private static final double OTHER_ONE_OVER_A;

    static {
        double mass = 0.0;
        double zOverA = 0.0;
        double z2OverA = 0.0;
        double oneOverA = 0.0;
        MetalMixture mix = MetalMixture.GS98;
        for (int i = 0; i < mix.elements().size(); i++) {
            Element e = mix.elements().get(i);
            if (e.charge() >= 6 && e.charge() <= 8) {
                continue;
            }
            double w = mix.massFractionOfZ(i);
            mass += w;
            zOverA += w * e.charge() / e.massAmu();
            z2OverA += w * e.charge() * e.charge() / e.massAmu();
            oneOverA += w / e.massAmu();
        }
        OTHER_Z_OVER_A = zOverA / mass;
        OTHER_Z2_OVER_A = z2OverA / mass;
        OTHER_ONE_OVER_A = oneOverA / mass;
    }

    private PlasmaMoments() {
    }

    /** B = sum over metals of X_j Z_j^2 / A_j (Kippenhahn, Weigert &amp; Weiss 2012, free-free opacity). */
    static double metalChargeSquared(Composition c) {
        return c.c12() * 36.0 / 12.0 + c.n14() * 49.0 / 14.0 + c.o16() * 64.0 / 16.0
                + c.otherMetals() * OTHER_Z2_OVER_A;
    }

    /** Sum over all ions of X_j Z_j^2 / A_j = X + Y + B. */
    static double chargeSquaredPerMass(Composition c) {
        return c.x() + c.y() + metalChargeSquared(c);
    }

    /** Free electrons per atomic mass unit at full ionization, 1/mu_e = X + Y/2 + sum_metals X_j Z_j/A_j. */
    static double electronsPerMass(Composition c) {
        return c.x() + 0.5 * c.y() + 0.5 * (c.c12() + c.n14() + c.o16()) + c.otherMetals() * OTHER_Z_OVER_A;
    }

    /** Ions per atomic mass unit, sum X_j/A_j. */
    static double ionsPerMass(Composition c) {
        return c.x() + 0.25 * c.y() + c.c12() / 12.0 + c.n14() / 14.0 + c.o16() / 16.0
                + c.otherMetals() * OTHER_ONE_OVER_A;
    }
}
