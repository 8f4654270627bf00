package org.convgrid.engine.physics.atmosphere;

/**
 * Bicubic Hermite interpolation on a uniform grid from node values, first derivatives and a cross derivative
 * estimated by centred differences of the first derivatives (one-sided at edges and beside missing nodes).
 * The interpolant and its first derivatives are continuous across cell edges. Missing nodes are NaN and
 * make every cell they touch evaluate to NaN.
 */
final class HermitePatch {

    private final double[][] f;
    private final double[][] fx;
    private final double[][] fy;
    private final double[][] fxy;
    private final double hx;
    private final double hy;

    /**
     * @param f node values
     * @param fx derivatives by x (per unit x, not per cell)
     * @param fy derivatives by y
     * @param hx node spacing in x
     * @param hy node spacing in y
     */
    HermitePatch(double[][] f, double[][] fx, double[][] fy, double hx, double hy) {
        this.f = f;
        this.fx = fx;
        this.fy = fy;
        this.hx = hx;
        this.hy = hy;
        int nx = f.length;
        int ny = f[0].length;
        fxy = new double[nx][ny];
        for (int i = 0; i < nx; i++) {
            for (int j = 0; j < ny; j++) {
                double a = difference(fx, i, j, false) / hy;
                double b = difference(fy, i, j, true) / hx;
                fxy[i][j] = Double.isNaN(a) ? b : Double.isNaN(b) ? a : 0.5 * (a + b);
            }
        }
    }

    /** Centred (or one-sided) difference of g at (i, j) along x (alongX) or y, per node step; NaN if none. */
    private static double difference(double[][] g, int i, int j, boolean alongX) {
        int n = alongX ? g.length : g[0].length;
        int k = alongX ? i : j;
        double here = g[i][j];
        double minus = k > 0 ? (alongX ? g[i - 1][j] : g[i][j - 1]) : Double.NaN;
        double plus = k < n - 1 ? (alongX ? g[i + 1][j] : g[i][j + 1]) : Double.NaN;
        if (!Double.isNaN(minus) && !Double.isNaN(plus)) {
            return 0.5 * (plus - minus);
        }
        if (!Double.isNaN(plus)) {
            return plus - here;
        }
        return here - minus; // NaN when neither neighbour exists

    }

    /**
     * Value and derivatives (per unit x and y) in cell (i, j) at fractional position (u, v) in [0, 1]^2.
     *
     * @return {f, df/dx, df/dy}
     */
    double[] evaluate(int i, int j, double u, double v) {
        double[] au = {1 - u * u * (3 - 2 * u), u * u * (3 - 2 * u)};
        double[] bu = {u * (1 - u) * (1 - u), u * u * (u - 1)};
        double[] dau = {6 * u * (u - 1), 6 * u * (1 - u)};
        double[] dbu = {(1 - u) * (1 - 3 * u), u * (3 * u - 2)};
        double[] av = {1 - v * v * (3 - 2 * v), v * v * (3 - 2 * v)};
        double[] bv = {v * (1 - v) * (1 - v), v * v * (v - 1)};
        double[] dav = {6 * v * (v - 1), 6 * v * (1 - v)};
        double[] dbv = {(1 - v) * (1 - 3 * v), v * (3 * v - 2)};
        double value = 0;
        double dx = 0;
        double dy = 0;
        for (int a = 0; a < 2; a++) {
            for (int b = 0; b < 2; b++) {
                double c0 = f[i + a][j + b];
                double cx = hx * fx[i + a][j + b];
                double cy = hy * fy[i + a][j + b];
                double cxy = hx * hy * fxy[i + a][j + b];
                value += c0 * au[a] * av[b] + cx * bu[a] * av[b] + cy * au[a] * bv[b] + cxy * bu[a] * bv[b];
                dx += c0 * dau[a] * av[b] + cx * dbu[a] * av[b] + cy * dau[a] * bv[b] + cxy * dbu[a] * bv[b];
                dy += c0 * au[a] * dav[b] + cx * bu[a] * dav[b] + cy * au[a] * dbv[b] + cxy * bu[a] * dbv[b];
            }
        }
        return new double[] {value, dx / hx, dy / hy};
    }
}
