package org.convgrid.engine.physics.interpolation;

/**
 * Piecewise-cubic Hermite interpolation: on a cell [x_i, x_i+1] of width h, with t = (x - x_i)/h,
 * <pre>
 *   p(t) = h00(t) f_i + h10(t) h m_i + h01(t) f_i+1 + h11(t) h m_i+1
 *   h00 = 2t^3 - 3t^2 + 1, h10 = t^3 - 2t^2 + t, h01 = -2t^3 + 3t^2, h11 = t^3 - t^2
 * </pre>
 * (the cubic Hermite basis; e.g. Fritsch &amp; Carlson 1980, SIAM J. Numer. Anal. 17, 238, eq. 2). Values and first
 * derivatives are continuous across cells whatever the node slopes m_i. Where the slopes are not known they are
 * the three-point parabolic slopes of Steffen 1990 (A&amp;A 239, 443, eq. 6), one-sided three-point at the ends;
 * they are linear in the data, so an interpolant is a fixed weighted sum of node values ({@link HermiteAxis}). The
 * monotonicity limiter of Fritsch &amp; Carlson and Steffen is not applied: it would make the weights depend on the
 * data. All methods are static, pure and allocation-free unless they say they build an array.
 */
public final class CubicHermite {

    private CubicHermite() {
    }

    /** p(t) on the unit cell: end values p0, p1, end slopes m0, m1 per unit t. */
    public static double value(double t, double p0, double p1, double m0, double m1) {
        double t2 = t * t;
        double t3 = t2 * t;
        return (2.0 * t3 - 3.0 * t2 + 1.0) * p0 + (t3 - 2.0 * t2 + t) * m0 + (-2.0 * t3 + 3.0 * t2) * p1
                + (t3 - t2) * m1;
    }

    /** dp/dt on the unit cell. */
    public static double slope(double t, double p0, double p1, double m0, double m1) {
        double t2 = t * t;
        return (6.0 * t2 - 6.0 * t) * (p0 - p1) + (3.0 * t2 - 4.0 * t + 1.0) * m0 + (3.0 * t2 - 2.0 * t) * m1;
    }

    /** d2p/dt2 on the unit cell. */
    public static double curvature(double t, double p0, double p1, double m0, double m1) {
        return (12.0 * t - 6.0) * (p0 - p1) + (6.0 * t - 4.0) * m0 + (6.0 * t - 2.0) * m1;
    }

    /** Index i of the cell [g_i, g_i+1] holding x (clamped to the first and last cell); g strictly increasing. */
    public static int cell(double[] g, double x) {
        int lo = 0;
        int hi = g.length - 1;
        while (hi - lo > 1) {
            int mid = (lo + hi) >>> 1;
            if (g[mid] <= x) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return lo;
    }

    /**
     * The parabolic slope at node i is a sum c_k f_k over node i and its two neighbours (at an end: the three
     * nodes there); this returns c for node {@code node}, zero outside those three. Two-node grids have the chord
     * slope.
     */
    public static double slopeWeight(double[] g, int i, int node) {
        int n = g.length;
        if (n == 2) {
            double c = 1.0 / (g[1] - g[0]);
            return node == 0 ? -c : node == 1 ? c : 0.0;
        }
        int c = Math.min(Math.max(i, 1), n - 2);
        if (node < c - 1 || node > c + 1) {
            return 0.0;
        }
        double hm = g[c] - g[c - 1];
        double hp = g[c + 1] - g[c];
        double s = hm + hp;
        // slope = a dm + b dp with dm = (f_c - f_c-1)/hm, dp = (f_c+1 - f_c)/hp
        double a;
        double b;
        if (i == c) {
            a = hp / s;
            b = hm / s;
        } else if (i < c) {
            a = 1.0 + hm / s;
            b = -hm / s;
        } else {
            a = -hp / s;
            b = 1.0 + hp / s;
        }
        if (node == c - 1) {
            return -a / hm;
        }
        return node == c ? a / hm - b / hp : b / hp;
    }

    /** Node slopes of values v on grid g (parabolic, one-sided at the ends). Builds the returned array. */
    public static double[] slopes(double[] g, double[] v) {
        return slopes(g, v, 0, g.length);
    }

    /**
     * Node slopes of v[from..to-1] on g[from..to-1] (parabolic, one-sided at the ends of that run; the chord for two
     * nodes, zero for one), written into a new array of the full length (zero outside the run). The same slopes as
     * {@link #slopeWeight} combines, computed directly because tables build ~10^5 of them at start-up.
     */
    public static double[] slopes(double[] g, double[] v, int from, int to) {
        double[] d = new double[g.length];
        int n = to - from;
        if (n == 2) {
            d[from] = d[from + 1] = (v[from + 1] - v[from]) / (g[from + 1] - g[from]);
        }
        for (int i = from; n > 2 && i < to; i++) {
            int c = Math.min(Math.max(i, from + 1), to - 2);
            double hm = g[c] - g[c - 1];
            double hp = g[c + 1] - g[c];
            double dm = (v[c] - v[c - 1]) / hm;
            double dp = (v[c + 1] - v[c]) / hp;
            if (i == c) {
                d[i] = (hp * dm + hm * dp) / (hm + hp);
            } else if (i < c) {
                d[i] = dm - hm * (dp - dm) / (hm + hp);
            } else {
                d[i] = dp + hp * (dp - dm) / (hm + hp);
            }
        }
        return d;
    }

    /**
     * Tensor-product bicubic Hermite on one cell. {@code data} holds per node four numbers, value, d/dx, d/dy and
     * d2/dxdy (per unit x and y); {@code k00} is the offset of node (i, j), {@code k10} of node (i+1, j), and node
     * (i, j+1) follows each of them after four numbers. Writes value, d/dx, d/dy at (u, v) (fractions of the
     * cell widths hx, hy) into out[offset..offset+2].
     */
    public static void bicubic(double[] data, int k00, int k10, double u, double v, double hx, double hy,
                               double[] out, int offset) {
        int k01 = k00 + 4;
        int k11 = k10 + 4;
        // along y at the two x nodes: value, its y-slope, the x-slope, and its y-slope
        double g0 = value(v, data[k00], data[k01], hy * data[k00 + 2], hy * data[k01 + 2]);
        double g1 = value(v, data[k10], data[k11], hy * data[k10 + 2], hy * data[k11 + 2]);
        double gv0 = slope(v, data[k00], data[k01], hy * data[k00 + 2], hy * data[k01 + 2]);
        double gv1 = slope(v, data[k10], data[k11], hy * data[k10 + 2], hy * data[k11 + 2]);
        double s0 = value(v, data[k00 + 1], data[k01 + 1], hy * data[k00 + 3], hy * data[k01 + 3]);
        double s1 = value(v, data[k10 + 1], data[k11 + 1], hy * data[k10 + 3], hy * data[k11 + 3]);
        double sv0 = slope(v, data[k00 + 1], data[k01 + 1], hy * data[k00 + 3], hy * data[k01 + 3]);
        double sv1 = slope(v, data[k10 + 1], data[k11 + 1], hy * data[k10 + 3], hy * data[k11 + 3]);
        out[offset] = value(u, g0, g1, hx * s0, hx * s1);
        out[offset + 1] = slope(u, g0, g1, hx * s0, hx * s1) / hx;
        out[offset + 2] = value(u, gv0, gv1, hx * sv0, hx * sv1) / hy;
    }
}
