package org.convgrid.engine.physics.atmosphere;

import org.convgrid.engine.physics.interpolation.CubicHermite;

/**
 * Bicubic Hermite interpolation on a uniform grid from node values, first derivatives and a cross derivative
 * estimated by the centred difference along x of the y derivative (one-sided at edges and beside a missing node;
 * the difference along y of the x derivative where a node has no neighbour along x). The interpolant and its first
 * derivatives are continuous across cell edges (each node has one cross derivative, whichever cell asks). Missing
 * nodes are NaN and make every cell they touch evaluate to NaN.
 *
 * <p>One difference rather than the average of both: a corner then needs its neighbours along x only, so a cell
 * reads at most 8 nodes instead of 12, and a band of cells one or two rows deep in y (the zero-age surfaces of a grid
 * line) integrates no rows outside it. The 200-model zero-age grid integrated 397 atmosphere nodes instead of 684;
 * the table's error at two points per cell of its band, against a direct integration, moved from mean 3.83e-4 /
 * 4.23e-4 / 4.45e-4 to 3.92e-4 / 4.32e-4 / 4.60e-4 in ln P at Z = 0.004 / 0.02 / 0.03 (AtmosphereNodeProbe,
 * 2026-12-03). The x spacing of the default table is a tenth of the y spacing, so the difference along x is the
 * finer one.
 *
 * <p>Nodes are read through a {@link NodeField} when a cell is evaluated, so a caller may compute them on
 * first use: a cell reads its four corners and, for the cross derivatives, their neighbours along x (at most 8
 * nodes; those along y only where a neighbour along x is missing). The result depends only on those node values,
 * never on which nodes exist already.
 */
final class HermitePatch {

    /** Node components: the value and its derivatives by x and y (per unit x and y, not per cell). */
    static final int VALUE = 0;
    static final int D_DX = 1;
    static final int D_DY = 2;

    /** Node (i, j) component {@link #VALUE}, {@link #D_DX} or {@link #D_DY}; NaN for a missing node. */
    @FunctionalInterface
    interface NodeField {
        double get(int i, int j, int component);
    }

    private final int nx;
    private final int ny;
    private final double hx;
    private final double hy;

    /**
     * @param nx nodes in x
     * @param ny nodes in y
     * @param hx node spacing in x
     * @param hy node spacing in y
     */
    HermitePatch(int nx, int ny, double hx, double hy) {
        this.nx = nx;
        this.ny = ny;
        this.hx = hx;
        this.hy = hy;
    }

    /**
     * Value and derivatives (per unit x and y) in cell (i, j) at fractional position (u, v) in [0, 1]^2.
     *
     * @return {f, df/dx, df/dy}
     */
    double[] evaluate(NodeField f, int i, int j, double u, double v) {
        // The four corners in the layout of CubicHermite.bicubic: (i, j), (i, j+1) at +4; (i+1, j), (i+1, j+1) at +8.
        double[] data = new double[16];
        corner(f, i, j, data, 0);
        corner(f, i, j + 1, data, 4);
        corner(f, i + 1, j, data, 8);
        corner(f, i + 1, j + 1, data, 12);
        double[] out = new double[3];
        CubicHermite.bicubic(data, 0, 8, u, v, hx, hy, out, 0);
        return out;
    }

    /**
     * Value, d/dx, d/dy and the estimated d2/dxdy of node (i, j) at data[k..k+3]; the difference along y is only
     * taken (and its nodes only read) where there is none along x.
     */
    private void corner(NodeField f, int i, int j, double[] data, int k) {
        double b = difference(f, i, j, D_DY, true) / hx;
        data[k] = f.get(i, j, VALUE);
        data[k + 1] = f.get(i, j, D_DX);
        data[k + 2] = f.get(i, j, D_DY);
        data[k + 3] = Double.isNaN(b) ? difference(f, i, j, D_DX, false) / hy : b;
    }

    /** Centred (or one-sided) difference of a component at (i, j) along x (alongX) or y, per node step; NaN if none. */
    private double difference(NodeField f, int i, int j, int component, boolean alongX) {
        int n = alongX ? nx : ny;
        int k = alongX ? i : j;
        double here = f.get(i, j, component);
        double minus = k > 0 ? (alongX ? f.get(i - 1, j, component) : f.get(i, j - 1, component)) : Double.NaN;
        double plus = k < n - 1 ? (alongX ? f.get(i + 1, j, component) : f.get(i, j + 1, component)) : Double.NaN;
        if (!Double.isNaN(minus) && !Double.isNaN(plus)) {
            return 0.5 * (plus - minus);
        }
        if (!Double.isNaN(plus)) {
            return plus - here;
        }
        return here - minus; // NaN when neither neighbour exists
    }
}
