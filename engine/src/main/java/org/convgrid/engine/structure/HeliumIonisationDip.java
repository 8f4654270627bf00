package org.convgrid.engine.structure;

/**
 * Where helium's second ionisation (He+ to He++, 54.4 eV) lowers the first adiabatic exponent Gamma1 in a star's
 * outer layers: the minimum of Gamma1 between {@value #COOLEST_K} and {@value #HOTTEST_K} K, below the dip hydrogen
 * and helium's first ionisation make near the surface and above the fully ionised interior (where Gamma1 returns to
 * ~5/3). The dip lowers the sound speed over a thin layer, and its acoustic depth is the one the helium "glitch" in
 * the frequencies of solar-like oscillators measures (Gough 1990, LNP 367, 283; Houdek &amp; Gough 2007, MNRAS 375,
 * 861; references from memory). Which point of the dip the fitted depth stands for depends on the fitting formula:
 * the minimum is common practice, and some fits find the Gamma1 peak between the two helium dips instead (Broomhall
 * et al. 2014, MNRAS 440, 1828; from memory), a little shallower.
 *
 * <p>The minimum is the lowest local minimum of Gamma1 on the mesh in that temperature range (the wing of the
 * hydrogen dip reaches into its cool end with lower values, so the range's lowest point is not it), moved to the
 * vertex of the parabola in r through it and its two neighbours. None (NaN) when Gamma1 rises less than
 * {@value #LEAST_DIP} from it on either side within the range (no dip to speak of: dense envelopes below ~0.6 Msun,
 * where the ionisation is spread out), or when Gamma1 anywhere in the range exceeds 5/3 by more than 0.01, which a
 * fully ionised ideal gas never does (our equation of state's regime ends there, in envelopes of M dwarfs). Stateless.
 */
public final class HeliumIonisationDip {

    /** Coolest temperature searched, K: above the hydrogen and first-helium dip (~1e4-2e4 K in the Sun). */
    static final double COOLEST_K = 3.0e4;
    /** Hottest temperature searched, K: helium is fully ionised well below it at the densities of stellar envelopes. */
    static final double HOTTEST_K = 4.0e5;
    /** Least fall of Gamma1 to the minimum from the highest value on either side of it in the range. */
    static final double LEAST_DIP = 0.005;
    /** Gamma1 of a fully ionised ideal monatomic gas, which ionisation and radiation only lower. */
    private static final double IDEAL_MONATOMIC = 5.0 / 3.0;
    /** Above 5/3 by more than this the equation of state is outside its regime, and no dip is reported. */
    private static final double IDEAL_TOLERANCE = 0.01;

    private HeliumIonisationDip() {
    }

    /** The radius of the dip's minimum, cm; NaN when the model shows none. */
    public static double radiusOf(StellarModel model) {
        StellarProfile p = model.profile();
        int n = p.size();
        double[] gamma1 = new double[n];
        double[] temperature = new double[n];
        double[] radius = new double[n];
        for (int k = 0; k < n; k++) {
            gamma1[k] = p.eosState(k).gamma1();
            temperature[k] = p.temperature(k);
            radius[k] = p.radius(k);
        }
        return radiusOf(radius, temperature, gamma1);
    }

    /**
     * The radius of the dip's minimum, cm; NaN when there is none.
     *
     * @param radius r at each point, cm, increasing
     * @param temperature T at each point, K
     * @param gamma1 Gamma1 at each point
     */
    public static double radiusOf(double[] radius, double[] temperature, double[] gamma1) {
        int least = -1;
        for (int k = 1; k < radius.length - 1; k++) {
            if (!inRange(temperature[k - 1]) || !inRange(temperature[k]) || !inRange(temperature[k + 1])) {
                continue;
            }
            if (gamma1[k] > IDEAL_MONATOMIC + IDEAL_TOLERANCE) {
                // Gamma1 above 5/3: the equation of state is outside its regime here (cool dense M-dwarf envelopes)
                return Double.NaN;
            }
            boolean localMinimum = gamma1[k] < gamma1[k - 1] && gamma1[k] < gamma1[k + 1];
            if (localMinimum && (least < 0 || gamma1[k] < gamma1[least])) {
                least = k;
            }
        }
        if (least < 0 || !(highestInRange(temperature, gamma1, 0, least) - gamma1[least] >= LEAST_DIP)
                || !(highestInRange(temperature, gamma1, least + 1, radius.length) - gamma1[least] >= LEAST_DIP)) {
            return Double.NaN;
        }
        return vertex(radius[least - 1], radius[least], radius[least + 1], gamma1[least - 1], gamma1[least],
                gamma1[least + 1]);
    }

    /** The highest Gamma1 of the points from index {@code from} (inclusive) to {@code to} within the range. */
    private static double highestInRange(double[] temperature, double[] gamma1, int from, int to) {
        double highest = Double.NEGATIVE_INFINITY;
        for (int k = from; k < to; k++) {
            if (inRange(temperature[k])) {
                highest = Math.max(highest, gamma1[k]);
            }
        }
        return highest;
    }

    private static boolean inRange(double temperature) {
        return temperature >= COOLEST_K && temperature <= HOTTEST_K;
    }

    /**
     * The abscissa of the vertex of the parabola through three points, the middle one the lowest; kept between the
     * outer two.
     */
    private static double vertex(double x0, double x1, double x2, double y0, double y1, double y2) {
        double left = (y1 - y0) / (x1 - x0);
        double right = (y2 - y1) / (x2 - x1);
        double curvature = (right - left) / (x2 - x0);
        if (!(curvature > 0.0)) {
            return x1;
        }
        // the slope at the midpoint of the left interval is left; it falls to zero at the vertex
        double x = 0.5 * (x0 + x1) - left / (2.0 * curvature);
        return Math.min(x2, Math.max(x0, x));
    }
}
