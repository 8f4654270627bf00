package org.convgrid.engine.physics.atmosphere;

import org.convgrid.engine.physics.interpolation.CubicHermite;

/**
 * Bicubic Hermite interpolation on a uniform grid from node values, first derivatives and a cross derivative
 * estimated by centred differences of the first derivatives (one-sided at edges and beside missing nodes).
 * The interpolant and its first derivatives are continuous across cell edges. Missing nodes are NaN and
 * make every cell they touch evaluate to NaN.
 *
 * <p>Nodes are read through a {@link NodeField} when a cell is evaluated, so a caller may compute them on
 * first use: a cell reads its four corners and, for the cross derivatives, their neighbours along each axis
 * (at most 12 nodes). The result depends only on those node values, never on which nodes exist already.
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

    /** Value, d/dx, d/dy and the estimated d2/dxdy of node (i, j) at data[k..k+3]. */
    private void corner(NodeField f, int i, int j, double[] data, int k) {
        double a = difference(f, i, j, D_DX, false) / hy;
        double b = difference(f, i, j, D_DY, true) / hx;
        data[k] = f.get(i, j, VALUE);
        data[k + 1] = f.get(i, j, D_DX);
        data[k + 2] = f.get(i, j, D_DY);
        data[k + 3] = Double.isNaN(a) ? b : Double.isNaN(b) ? a : 0.5 * (a + b);
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
