package org.convgrid.engine.physics.opacity;

/**
 * One table of log10 kappa on a rectilinear (log10 T, log10 R) grid, interpolated by tensor-product cubic Hermite
 * polynomials. Node slopes are second-order finite differences on the (possibly non-uniform) grid, one-sided at
 * the edges, so value and first derivatives are continuous across cells (C1). Immutable.
 */
final class BicubicLogTable {

    private final double[] xs;
    private final double[] ys;
    private final double[] f;
    private final double[] fx;
    private final double[] fy;
    private final double[] fxy;

    /** @param values values[i][j] at (xs[i], ys[j]); grids strictly increasing, &gt;= 2 points each */
    BicubicLogTable(double[] xs, double[] ys, double[][] values) {
        this.xs = xs.clone();
        this.ys = ys.clone();
        int nx = xs.length;
        int ny = ys.length;
        f = new double[nx * ny];
        fx = new double[nx * ny];
        fy = new double[nx * ny];
        fxy = new double[nx * ny];
        for (int i = 0; i < nx; i++) {
            System.arraycopy(values[i], 0, f, i * ny, ny);
        }
        double[] col = new double[nx];
        double[] row = new double[ny];
        for (int j = 0; j < ny; j++) {
            for (int i = 0; i < nx; i++) {
                col[i] = f[i * ny + j];
            }
            double[] d = slopes(xs, col);
            for (int i = 0; i < nx; i++) {
                fx[i * ny + j] = d[i];
            }
        }
        for (int i = 0; i < nx; i++) {
            System.arraycopy(f, i * ny, row, 0, ny);
            System.arraycopy(slopes(ys, row), 0, fy, i * ny, ny);
            System.arraycopy(fx, i * ny, row, 0, ny);
            System.arraycopy(slopes(ys, row), 0, fxy, i * ny, ny);
        }
    }

    /** Second-order finite-difference slopes of v on grid g (one-sided three-point at the ends). */
    static double[] slopes(double[] g, double[] v) {
        int n = g.length;
        double[] d = new double[n];
        if (n == 2) {
            d[0] = d[1] = (v[1] - v[0]) / (g[1] - g[0]);
            return d;
        }
        for (int i = 0; i < n; i++) {
            int c = Math.min(Math.max(i, 1), n - 2);
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

    double[] xs() {
        return xs;
    }

    double[] ys() {
        return ys;
    }

    double node(int i, int j) {
        return f[i * ys.length + j];
    }

    boolean contains(double x, double y) {
        return x >= xs[0] && x <= xs[xs.length - 1] && y >= ys[0] && y <= ys[ys.length - 1];
    }

    /**
     * Interpolates at (x, y), which must lie inside the grid; writes value, d/dx, d/dy into out[offset..+2].
     */
    void evaluate(double x, double y, double[] out, int offset) {
        int i = cell(xs, x);
        int j = cell(ys, y);
        int ny = ys.length;
        double hx = xs[i + 1] - xs[i];
        double hy = ys[j + 1] - ys[j];
        double u = (x - xs[i]) / hx;
        double v = (y - ys[j]) / hy;
        int k00 = i * ny + j;
        int k01 = k00 + 1;
        int k10 = k00 + ny;
        int k11 = k10 + 1;
        // along y at the two x nodes: value, its y-derivative, the x-slope, and its y-derivative
        double g0 = hermite(v, f[k00], f[k01], hy * fy[k00], hy * fy[k01]);
        double g1 = hermite(v, f[k10], f[k11], hy * fy[k10], hy * fy[k11]);
        double gv0 = hermiteSlope(v, f[k00], f[k01], hy * fy[k00], hy * fy[k01]);
        double gv1 = hermiteSlope(v, f[k10], f[k11], hy * fy[k10], hy * fy[k11]);
        double s0 = hermite(v, fx[k00], fx[k01], hy * fxy[k00], hy * fxy[k01]);
        double s1 = hermite(v, fx[k10], fx[k11], hy * fxy[k10], hy * fxy[k11]);
        double sv0 = hermiteSlope(v, fx[k00], fx[k01], hy * fxy[k00], hy * fxy[k01]);
        double sv1 = hermiteSlope(v, fx[k10], fx[k11], hy * fxy[k10], hy * fxy[k11]);
        out[offset] = hermite(u, g0, g1, hx * s0, hx * s1);
        out[offset + 1] = hermiteSlope(u, g0, g1, hx * s0, hx * s1) / hx;
        out[offset + 2] = hermite(u, gv0, gv1, hx * sv0, hx * sv1) / hy;
    }

    private static int cell(double[] g, double x) {
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

    /** Cubic Hermite on [0, 1] with end values p0, p1 and end slopes m0, m1 (per unit t). */
    private static double hermite(double t, double p0, double p1, double m0, double m1) {
        double t2 = t * t;
        double t3 = t2 * t;
        return (2 * t3 - 3 * t2 + 1) * p0 + (t3 - 2 * t2 + t) * m0 + (-2 * t3 + 3 * t2) * p1 + (t3 - t2) * m1;
    }

    private static double hermiteSlope(double t, double p0, double p1, double m0, double m1) {
        double t2 = t * t;
        return (6 * t2 - 6 * t) * p0 + (3 * t2 - 4 * t + 1) * m0 + (-6 * t2 + 6 * t) * p1 + (3 * t2 - 2 * t) * m1;
    }
}
