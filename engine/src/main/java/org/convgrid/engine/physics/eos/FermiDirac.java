package org.convgrid.engine.physics.eos;

import org.convgrid.engine.physics.interpolation.CubicHermite;

/**
 * Non-relativistic Fermi-Dirac integrals F_k(eta) = int_0^inf x^k dx/(exp(x - eta) + 1), unnormalised
 * (standard statistical mechanics), for k = -1/2, 1/2, 3/2, with relative accuracy ~1e-11.
 *
 * <p>Inside [{@value #TABLE_MIN}, {@value #TABLE_MAX}] the values come from a cubic Hermite table built once at
 * class load by direct quadrature: with x = t^2 every integrand is an even function of t, analytic in a strip
 * around the real axis, so the trapezoidal rule on [0, inf) converges geometrically (Trefethen &amp; Weideman
 * 2014, SIAM Rev. 56, 385); the step is set from the distance of the nearest pole, t^2 = eta + i pi. The node
 * derivatives are exact, dF_k/deta = k F_{k-1} (and dF_{-1/2}/deta by its own quadrature), which makes the Hermite
 * interpolant accurate to ~h^4/384 with h = {@value #TABLE_STEP}. Below the table the alternating series
 * F_k = Gamma(k+1) sum (-1)^(n+1) e^(n eta)/n^(k+1) is exact; above it the Sommerfeld expansion to eta^-8 is used
 * (exponentially small terms ~e^-eta neglected). Immutable after class initialisation, hence thread-safe.
 */
public final class FermiDirac {

    /** Lowest eta served from the table. */
    public static final double TABLE_MIN = -10.0;
    /** Highest eta served from the table. */
    public static final double TABLE_MAX = 70.0;
    /** Table spacing in eta. */
    public static final double TABLE_STEP = 0.01;

    private static final int NODES = (int) Math.round((TABLE_MAX - TABLE_MIN) / TABLE_STEP) + 1;
    private static final double SQRT_PI = Math.sqrt(Math.PI);
    /** Gamma(k+1) for k = -1/2, 1/2, 3/2. */
    private static final double[] GAMMA = {SQRT_PI, 0.5 * SQRT_PI, 0.75 * SQRT_PI};
    private static final double[] ORDER = {-0.5, 0.5, 1.5};
    /** 2 (1 - 2^(1-2j)) zeta(2j) for j = 1..4: the Sommerfeld coefficients (Abramowitz &amp; Stegun 23.2.16). */
    private static final double[] SOMMERFELD = {
        Math.pow(Math.PI, 2) / 6.0, 7.0 * Math.pow(Math.PI, 4) / 360.0, 31.0 * Math.pow(Math.PI, 6) / 15120.0,
        127.0 * Math.pow(Math.PI, 8) / 604800.0};
    /** Integrand cut-off: the neglected tail is below exp(-TAIL) relative. */
    private static final double TAIL = 45.0;
    /** Trapezoid step as a fraction of the pole distance from the real t axis (error ~exp(-2 pi / fraction)). */
    private static final double STEP_PER_POLE_DISTANCE = 1.0 / 6.0;

    /** Most terms of the alternating series. */
    private static final int SERIES_TERMS = 400;
    /**
     * n^(-1/2), n^(-3/2), n^(-5/2), n^(1/2) and n^(3/2) for n = 1..{@value #SERIES_TERMS}: the powers of the
     * series with slopes, so that a term costs multiplications only (its square roots and divisions were most of
     * the cost of the equation of state in cool, non-degenerate gas).
     */
    private static final double[][] SERIES_POWERS = new double[5][SERIES_TERMS + 1];

    /** values[k][i] and slopes[k][i] for k = 0, 1, 2 (orders -1/2, 1/2, 3/2) at eta_i. */
    private static final double[][] VALUES = new double[3][NODES];
    private static final double[][] SLOPES = new double[3][NODES];

    static {
        for (int n = 1; n <= SERIES_TERMS; n++) {
            double root = Math.sqrt(n);
            SERIES_POWERS[0][n] = 1.0 / root;
            SERIES_POWERS[1][n] = 1.0 / (n * root);
            SERIES_POWERS[2][n] = 1.0 / (n * (double) n * root);
            SERIES_POWERS[3][n] = root;
            SERIES_POWERS[4][n] = n * root;
        }
        double[] f = new double[4];
        for (int i = 0; i < NODES; i++) {
            quadrature(TABLE_MIN + i * TABLE_STEP, f);
            for (int k = 0; k < 3; k++) {
                VALUES[k][i] = f[k];
            }
            SLOPES[0][i] = f[3];
            SLOPES[1][i] = 0.5 * f[0];
            SLOPES[2][i] = 1.5 * f[1];
        }
    }

    private FermiDirac() {
    }

    /** F_{-1/2}(eta). */
    public static double minusHalf(double eta) {
        return value(0, eta);
    }

    /** F_{1/2}(eta). */
    public static double half(double eta) {
        return value(1, eta);
    }

    /** F_{3/2}(eta). */
    public static double threeHalves(double eta) {
        return value(2, eta);
    }

    /**
     * All three at once (one table look-up) into {@code out[0..2]} = F_{-1/2}, F_{1/2}, F_{3/2}; no allocation.
     */
    public static void all(double eta, double[] out) {
        if (eta < TABLE_MIN || eta > TABLE_MAX) {
            for (int k = 0; k < 3; k++) {
                out[k] = outside(k, eta);
            }
            return;
        }
        double s = (eta - TABLE_MIN) / TABLE_STEP;
        int i = Math.min((int) s, NODES - 2);
        double t = s - i;
        for (int k = 0; k < 3; k++) {
            out[k] = CubicHermite.value(t, VALUES[k][i], VALUES[k][i + 1], TABLE_STEP * SLOPES[k][i],
                    TABLE_STEP * SLOPES[k][i + 1]);
        }
    }

    /**
     * Values and eta-derivatives in one call, for the equation of state's analytic derivatives: out[0..2] =
     * F_{-1/2}, F_{1/2}, F_{3/2} (identical to {@link #all}), out[3..5] their first derivatives and out[6] the
     * second derivative of F_{-1/2}. Inside the table these are the derivatives of the Hermite interpolant itself
     * (so they are consistent with the values to rounding); below it the term-by-term derivatives of the series
     * (dF_k/deta = k F_{k-1}); above it those of the Sommerfeld expansion. No allocation.
     */
    static void withSlopes(double eta, double[] out) {
        if (eta > TABLE_MAX) {
            for (int k = 0; k < 3; k++) {
                out[k] = sommerfeld(ORDER[k], eta);
                out[3 + k] = ORDER[k] * sommerfeld(ORDER[k] - 1.0, eta);
            }
            out[6] = 0.75 * sommerfeld(-2.5, eta);
            return;
        }
        if (eta < TABLE_MIN) {
            seriesWithSlopes(eta, out);
            return;
        }
        double s = (eta - TABLE_MIN) / TABLE_STEP;
        int i = Math.min((int) s, NODES - 2);
        double t = s - i;
        for (int k = 0; k < 3; k++) {
            double[] v = VALUES[k];
            double[] g = SLOPES[k];
            double m0 = TABLE_STEP * g[i];
            double m1 = TABLE_STEP * g[i + 1];
            out[k] = CubicHermite.value(t, v[i], v[i + 1], m0, m1);
            out[3 + k] = CubicHermite.slope(t, v[i], v[i + 1], m0, m1) / TABLE_STEP;
        }
        out[6] = CubicHermite.curvature(t, VALUES[0][i], VALUES[0][i + 1], TABLE_STEP * SLOPES[0][i],
                TABLE_STEP * SLOPES[0][i + 1]) / (TABLE_STEP * TABLE_STEP);
    }

    /**
     * The alternating series of {@link #series} for all three orders and the first two derivatives of F_{-1/2}
     * with one exponential: the powers n^(k+1) come from a table built once, and the sum stops when the
     * fastest-growing term (n^(3/2) z^n, of the second derivative) falls below 1e-17 of its sum.
     */
    private static void seriesWithSlopes(double eta, double[] out) {
        double z = Math.exp(eta);
        double s0 = 0.0;
        double s1 = 0.0;
        double s2 = 0.0;
        double d1 = 0.0;
        double d2 = 0.0;
        double power = 1.0;
        for (int n = 1; n <= SERIES_TERMS; n++) {
            power *= z;
            double sign = (n % 2 == 1) ? power : -power;
            s0 += sign * SERIES_POWERS[0][n];
            s1 += sign * SERIES_POWERS[1][n];
            s2 += sign * SERIES_POWERS[2][n];
            d1 += sign * SERIES_POWERS[3][n];
            double fastest = sign * SERIES_POWERS[4][n];
            d2 += fastest;
            if (power * SERIES_POWERS[4][n] < 1e-17 * d2) {
                break;
            }
        }
        out[0] = GAMMA[0] * s0;
        out[1] = GAMMA[1] * s1;
        out[2] = GAMMA[2] * s2;
        out[3] = SQRT_PI * d1;
        out[4] = 0.5 * out[0];
        out[5] = 1.5 * out[1];
        out[6] = SQRT_PI * d2;
    }

    /**
     * dF_{-1/2}/deta: the derivative of the table interpolant inside the table (so it is consistent with
     * {@link #minusHalf}), the term-by-term derivative of the series below it and -F_{-3/2}/2 from the Sommerfeld
     * expansion above it.
     */
    public static double minusHalfSlope(double eta) {
        if (eta > TABLE_MAX) {
            return -0.5 * sommerfeld(-1.5, eta);
        }
        if (eta < TABLE_MIN) {
            double z = Math.exp(eta);
            double sum = 0.0;
            double power = 1.0;
            for (int n = 1; n <= 400; n++) {
                power *= z;
                double term = power * Math.sqrt(n);
                sum += (n % 2 == 1) ? term : -term;
                if (term < 1e-17 * sum) {
                    break;
                }
            }
            return SQRT_PI * sum;
        }
        double s = (eta - TABLE_MIN) / TABLE_STEP;
        int i = Math.min((int) s, NODES - 2);
        return CubicHermite.slope(s - i, VALUES[0][i], VALUES[0][i + 1], TABLE_STEP * SLOPES[0][i],
                TABLE_STEP * SLOPES[0][i + 1]) / TABLE_STEP;
    }

    /** Non-degenerate series, exact for eta &lt; 0 (expansion of the integrand in powers of e^(eta - x)). */
    public static double series(double order, double eta) {
        double gamma = order == -0.5 ? GAMMA[0] : order == 0.5 ? GAMMA[1] : GAMMA[2];
        double z = Math.exp(eta);
        double sum = 0.0;
        double power = 1.0;
        for (int n = 1; n <= 400; n++) {
            power *= z;
            double term = power / Math.pow(n, order + 1.0);
            sum += (n % 2 == 1) ? term : -term;
            if (term < 1e-17 * sum) {
                break;
            }
        }
        return gamma * sum;
    }

    /** Sommerfeld expansion to eta^-8, for eta &gt;&gt; 1 (Sommerfeld 1928, Z. Phys. 47, 1; from memory). */
    public static double sommerfeld(double order, double eta) {
        double sum = 1.0;
        double falling = 1.0;
        double inverse = 1.0 / (eta * eta);
        double power = 1.0;
        for (int j = 1; j <= SOMMERFELD.length; j++) {
            falling *= (order + 3.0 - 2.0 * j) * (order + 2.0 - 2.0 * j);
            power *= inverse;
            sum += SOMMERFELD[j - 1] * falling * power;
        }
        return Math.pow(eta, order + 1.0) / (order + 1.0) * sum;
    }

    /**
     * Direct quadrature (the table's source): out[0..2] = F_{-1/2}, F_{1/2}, F_{3/2}, out[3] = dF_{-1/2}/deta.
     */
    public static void quadrature(double eta, double[] out) {
        double re = eta;
        double poleDistance = Math.sqrt(0.5 * (Math.hypot(re, Math.PI) - re));
        double h = STEP_PER_POLE_DISTANCE * poleDistance;
        double tMax = Math.sqrt(Math.max(eta, 0.0) + TAIL);
        int n = (int) Math.ceil(tMax / h);
        // t = 0 carries half weight; the integrands 2 t^(2k+1) p are even in t.
        double p0 = 1.0 / (Math.exp(-eta) + 1.0);
        double s0 = 0.5 * p0;
        double s1 = 0.0;
        double s2 = 0.0;
        double s3 = 0.5 * p0 * (1.0 - p0);
        for (int j = 1; j <= n; j++) {
            double t = j * h;
            double t2 = t * t;
            double p = 1.0 / (Math.exp(t2 - eta) + 1.0);
            s0 += p;
            s1 += t2 * p;
            s2 += t2 * t2 * p;
            s3 += p * (1.0 - p);
        }
        out[0] = 2.0 * h * s0;
        out[1] = 2.0 * h * s1;
        out[2] = 2.0 * h * s2;
        out[3] = 2.0 * h * s3;
    }

    private static double value(int k, double eta) {
        if (eta < TABLE_MIN || eta > TABLE_MAX) {
            return outside(k, eta);
        }
        double s = (eta - TABLE_MIN) / TABLE_STEP;
        int i = Math.min((int) s, NODES - 2);
        return CubicHermite.value(s - i, VALUES[k][i], VALUES[k][i + 1], TABLE_STEP * SLOPES[k][i],
                TABLE_STEP * SLOPES[k][i + 1]);
    }

    private static double outside(int k, double eta) {
        return eta < TABLE_MIN ? series(ORDER[k], eta) : sommerfeld(ORDER[k], eta);
    }
}
