package org.convgrid.engine.physics.eos;

/**
 * Excess (Coulomb) free energy of a one-component plasma, per ion in units of kT, as a function of the coupling
 * parameter Gamma: the analytic all-Gamma fit of Chabrier &amp; Potekhin 1998 (Phys. Rev. E 58, 4941, eq. 28;
 * coefficients from memory, checked in the tests against the Debye-Huckel limit and against the Slattery, Doolen
 * &amp; DeWitt 1982 fit at Gamma = 10):
 * f = A1 [sqrt(G(A2 + G)) - A2 ln(sqrt(G/A2) + sqrt(1 + G/A2))] + 2 A3 [sqrt(G) - arctan(sqrt(G))],
 * u = G df/dG = G^(3/2) [A1/sqrt(A2 + G) + A3/(1 + G)], with A3 = -sqrt(3)/2 - A1/sqrt(A2) so that the
 * Debye-Huckel limit f = -G^(3/2)/sqrt(3) holds exactly at small Gamma, and f ~ A1 G (close to the Madelung
 * energy of the crystal) at large Gamma.
 */
final class CoulombPlasma {

    static final double A1 = -0.9052;
    static final double A2 = 0.6322;
    static final double A3 = -Math.sqrt(3.0) / 2.0 - A1 / Math.sqrt(A2);

    private CoulombPlasma() {
    }

    /** Excess free energy per ion over kT. */
    static double freeEnergy(double gamma) {
        double sg = Math.sqrt(gamma);
        double y = gamma / A2;
        return A1 * (Math.sqrt(gamma * (A2 + gamma)) - A2 * Math.log(Math.sqrt(y) + Math.sqrt(1.0 + y)))
                + 2.0 * A3 * (sg - Math.atan(sg));
    }

    /** Excess internal energy per ion over kT, Gamma df/dGamma; the excess pressure is a third of it times n kT. */
    static double energy(double gamma) {
        return gamma * Math.sqrt(gamma) * (A1 / Math.sqrt(A2 + gamma) + A3 / (1.0 + gamma));
    }

    /** d(energy)/d ln Gamma, the analytic derivative of {@link #energy}. */
    static double energySlope(double gamma) {
        double root = Math.sqrt(A2 + gamma);
        double inverse = 1.0 / (1.0 + gamma);
        double g15 = gamma * Math.sqrt(gamma);
        return g15 * (1.5 * (A1 / root + A3 * inverse) - 0.5 * A1 * gamma / (root * root * root)
                - A3 * gamma * inverse * inverse);
    }
}
