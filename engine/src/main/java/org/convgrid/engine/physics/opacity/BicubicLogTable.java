package org.convgrid.engine.physics.opacity;

import org.convgrid.engine.physics.interpolation.CubicHermite;

/**
 * One table of log10 kappa on a rectilinear (log10 T, log10 R) grid, some nodes possibly "not in table" (NaN),
 * interpolated by tensor-product cubic Hermite polynomials ({@link CubicHermite#bicubic}). Node slopes are the
 * parabolic three-point slopes on the (possibly non-uniform) grid, taken within the run of present nodes that holds
 * the node (one-sided at its ends, zero for a lone node), so value and first derivatives are continuous across
 * cells whose corners are all present (C1). A cell with a missing corner does not answer: nothing is extrapolated
 * into it. Immutable.
 */
final class BicubicLogTable {

    /** Numbers per node: value, d/dlog T, d/dlog R, d2/dlog T dlog R. */
    static final int PER_NODE = 4;

    private final double[] logT;
    private final double[] logR;
    /** Node (i, j) at PER_NODE (i nR + j), the layout of {@link CubicHermite#bicubic}. */
    private final double[] data;
    private final boolean[] cellAnswers;
    /** Per log T cell i: cells (i, j) answer for every j below this (the table's right edge in log R there). */
    private final int[] answeredColumns;

    /** @param values values[i][j] at (logT[i], logR[j]), NaN where not in table; grids strictly increasing */
    BicubicLogTable(double[] logT, double[] logR, double[][] values) {
        this.logT = logT;
        this.logR = logR;
        int nT = logT.length;
        int nR = logR.length;
        data = new double[PER_NODE * nT * nR];
        double[][] dT = new double[nT][];
        double[][] dR = new double[nT][];
        double[][] dTR = new double[nT][];
        double[][] columns = transpose(values);
        double[][] dTColumns = new double[nR][];
        for (int j = 0; j < nR; j++) {
            dTColumns[j] = runSlopes(logT, columns[j]);
        }
        double[][] dTRows = transpose(dTColumns);
        for (int i = 0; i < nT; i++) {
            dT[i] = dTRows[i];
            dR[i] = runSlopes(logR, values[i]);
            dTR[i] = runSlopes(logR, dT[i]);
        }
        for (int i = 0; i < nT; i++) {
            for (int j = 0; j < nR; j++) {
                int k = PER_NODE * (i * nR + j);
                data[k] = values[i][j];
                data[k + 1] = dT[i][j];
                data[k + 2] = dR[i][j];
                data[k + 3] = dTR[i][j];
            }
        }
        cellAnswers = new boolean[(nT - 1) * (nR - 1)];
        answeredColumns = new int[nT - 1];
        for (int i = 0; i < nT - 1; i++) {
            boolean run = true;
            for (int j = 0; j < nR - 1; j++) {
                boolean ok = !Double.isNaN(values[i][j]) && !Double.isNaN(values[i][j + 1])
                        && !Double.isNaN(values[i + 1][j]) && !Double.isNaN(values[i + 1][j + 1]);
                cellAnswers[i * (nR - 1) + j] = ok;
                run &= ok;
                if (run) {
                    answeredColumns[i] = j + 1;
                }
            }
        }
    }

    /** Slopes of v on g within each run of non-NaN values (NaN where v is NaN). */
    private static double[] runSlopes(double[] g, double[] v) {
        int n = g.length;
        double[] d = new double[n];
        int start = 0;
        while (start < n) {
            if (Double.isNaN(v[start])) {
                d[start++] = Double.NaN;
                continue;
            }
            int end = start;
            while (end + 1 < n && !Double.isNaN(v[end + 1])) {
                end++;
            }
            if (end > start) {
                double[] slopes = CubicHermite.slopes(g, v, start, end + 1);
                System.arraycopy(slopes, start, d, start, end + 1 - start);
            }
            start = end + 1;
        }
        return d;
    }

    private static double[][] transpose(double[][] a) {
        double[][] t = new double[a[0].length][a.length];
        for (int i = 0; i < a.length; i++) {
            for (int j = 0; j < a[0].length; j++) {
                t[j][i] = a[i][j];
            }
        }
        return t;
    }

    /** Tabulated value at node (i, j); NaN when not in table. */
    double node(int i, int j) {
        return data[PER_NODE * (i * logR.length + j)];
    }

    /** Whether cell (i, j) (log T cell i, log R cell j) has all four corners in the table. */
    boolean answers(int i, int j) {
        return cellAnswers[i * (logR.length - 1) + j];
    }

    /** Number of leading log R cells of log T cell i that answer. */
    int answeredColumns(int i) {
        return answeredColumns[i];
    }

    /** Copies this table's node data (layout of {@link CubicHermite#bicubic}) into dest from offset on. */
    void copyNodeData(double[] dest, int offset) {
        System.arraycopy(data, 0, dest, offset, data.length);
    }

    /** Number of doubles {@link #copyNodeData} writes. */
    int nodeDataLength() {
        return data.length;
    }
}
