package org.convgrid.engine.physics.atmosphere;

import org.convgrid.engine.physics.interpolation.CubicHermite;

/**
 * Bicubic Hermite interpolation on a uniform grid from node values, first derivatives and a cross derivative
 * estimated by centred differences of the first derivatives (one-sided at edges and beside missing nodes).
 * The interpolant and its first derivatives are continuous across cell edges. Missing nodes are NaN and
 * make every cell they touch evaluate to NaN.
 */
final class HermitePatch {

    /** Per node (i, j), at offset 4 (i ny + j): value, d/dx, d/dy, d2/dxdy, the layout of CubicHermite.bicubic. */
    private final double[] data;
    private final int ny;
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
        this.hx = hx;
        this.hy = hy;
        int nx = f.length;
        this.ny = f[0].length;
        data = new double[4 * nx * ny];
        for (int i = 0; i < nx; i++) {
            for (int j = 0; j < ny; j++) {
                double a = difference(fx, i, j, false) / hy;
                double b = difference(fy, i, j, true) / hx;
                int k = 4 * (i * ny + j);
                data[k] = f[i][j];
                data[k + 1] = fx[i][j];
                data[k + 2] = fy[i][j];
                data[k + 3] = Double.isNaN(a) ? b : Double.isNaN(b) ? a : 0.5 * (a + b);
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
        double[] out = new double[3];
        int k00 = 4 * (i * ny + j);
        CubicHermite.bicubic(data, k00, k00 + 4 * ny, u, v, hx, hy, out, 0);
        return out;
    }
}
