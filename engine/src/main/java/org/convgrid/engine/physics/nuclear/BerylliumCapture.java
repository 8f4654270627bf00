package org.convgrid.engine.physics.nuclear;

/**
 * Electron capture 7Be(e-,nu)7Li in a fully ionized plasma, the branch that starts PP-II.
 *
 * <p>{@code lambda = 5.6e-9 (rho/mu_e) T6^(-1/2) [1 + 0.004 (T6 - 16)] s^-1}, a Bahcall-type fit
 * (Bahcall &amp; Moeller 1969 / Bahcall 1989, Neutrino Astrophysics; from memory). It gives a 7Be
 * lifetime of about 80 days at the solar centre. Valid for non-degenerate electrons, T6 ~ 10-20; outside that
 * range the linear temperature factor is clamped so the rate stays positive.
 */
final class BerylliumCapture {

    private static final double COEFFICIENT = 5.6e-9;
    private static final double SLOPE = 0.004;
    private static final double T6_REFERENCE = 16.0;
    /** Lower bound of the linear temperature factor, reached only well outside the fit's range (T6 &lt; ~-200). */
    private static final double MIN_FACTOR = 0.1;

    private BerylliumCapture() {
    }

    /**
     * @param density g cm^-3
     * @param electronsPerBaryon 1/mu_e
     * @param t6 temperature in 1e6 K
     * @return capture rate per 7Be nucleus, s^-1
     */
    static double rate(double density, double electronsPerBaryon, double t6) {
        return COEFFICIENT * density * electronsPerBaryon / Math.sqrt(t6) * factor(t6);
    }

    /** d ln(rate)/d ln T. */
    static double dlnRateDlnT(double t6) {
        double f = factor(t6);
        double dFactor = f > MIN_FACTOR ? SLOPE * t6 : 0.0;
        return -0.5 + dFactor / f;
    }

    private static double factor(double t6) {
        return Math.max(MIN_FACTOR, 1.0 + SLOPE * (t6 - T6_REFERENCE));
    }
}
