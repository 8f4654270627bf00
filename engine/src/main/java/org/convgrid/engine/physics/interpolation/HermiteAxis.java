package org.convgrid.engine.physics.interpolation;

/**
 * One interpolation axis whose node slopes are the parabolic slopes of {@link CubicHermite} (Steffen 1990, A&amp;A
 * 239, 443, eq. 6; one-sided at the ends): the interpolant at x is a weighted sum of at most four node values,
 * p(x) = sum_k w_k(x) f_k, with weights that depend on the grid alone. The slope coefficients are computed once
 * here, so a look-up costs one search and a few multiplications. Immutable; {@link #weights} writes into the
 * caller's array and allocates nothing.
 */
public final class HermiteAxis {

    /** Largest number of nodes with a weight at one point. */
    public static final int STENCIL = 4;

    private final double[] nodes;
    /** Node i's slope is sum_q coefficients[3i + q] f[slopeFrom[i] + q]. */
    private final double[] coefficients;
    private final int[] slopeFrom;

    /** @param nodes strictly increasing, at least one (a single node makes a constant) */
    public HermiteAxis(double[] nodes) {
        this.nodes = nodes.clone();
        int n = nodes.length;
        coefficients = new double[3 * n];
        slopeFrom = new int[n];
        for (int i = 0; n > 1 && i < n; i++) {
            slopeFrom[i] = Math.max(0, Math.min(i - 1, n - 3));
            for (int q = 0; q < 3 && slopeFrom[i] + q < n; q++) {
                coefficients[3 * i + q] = CubicHermite.slopeWeight(this.nodes, i, slopeFrom[i] + q);
            }
        }
    }

    /** Number of nodes. */
    public int size() {
        return nodes.length;
    }

    /** Node k. */
    public double node(int k) {
        return nodes[k];
    }

    /** Whether x lies within [first node, last node]. */
    public boolean contains(double x) {
        return x >= nodes[0] && x <= nodes[nodes.length - 1];
    }

    /** Cell holding x (see {@link CubicHermite#cell}); 0 for a single node. */
    public int cell(double x) {
        return nodes.length == 1 ? 0 : CubicHermite.cell(nodes, x);
    }

    /** First node of the stencil of cell i: the weights {@link #weights} writes belong to nodes from here on. */
    public int stencilStart(int cell) {
        return Math.max(0, Math.min(cell - 1, nodes.length - STENCIL));
    }

    /** Number of nodes in a stencil: min(4, size). */
    public int stencilSize() {
        return Math.min(STENCIL, nodes.length);
    }

    /**
     * Weights of the stencil nodes of cell i at x into w[offset..offset + stencilSize() - 1], node
     * {@code stencilStart(cell) + q} at offset + q. Exactly 1 and 0 at the nodes.
     */
    public void weights(int cell, double x, double[] w, int offset) {
        int size = stencilSize();
        for (int q = 0; q < size; q++) {
            w[offset + q] = 0.0;
        }
        if (nodes.length == 1) {
            w[offset] = 1.0;
            return;
        }
        int start = stencilStart(cell);
        double h = nodes[cell + 1] - nodes[cell];
        double t = (x - nodes[cell]) / h;
        double t2 = t * t;
        double t3 = t2 * t;
        w[offset + cell - start] += 2.0 * t3 - 3.0 * t2 + 1.0;
        w[offset + cell + 1 - start] += -2.0 * t3 + 3.0 * t2;
        double m0 = (t3 - 2.0 * t2 + t) * h;
        double m1 = (t3 - t2) * h;
        for (int q = 0; q < 3; q++) {
            int a = slopeFrom[cell] + q;
            int b = slopeFrom[cell + 1] + q;
            if (a < nodes.length) {
                w[offset + a - start] += m0 * coefficients[3 * cell + q];
            }
            if (b < nodes.length) {
                w[offset + b - start] += m1 * coefficients[3 * (cell + 1) + q];
            }
        }
    }
}
