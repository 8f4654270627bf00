package org.convgrid.engine.physics.opacity;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Objects;
import java.util.TreeSet;
import org.convgrid.engine.error.ConvgridException;
import org.convgrid.engine.error.ErrorKind;
import org.convgrid.engine.physics.interpolation.CubicHermite;
import org.convgrid.engine.physics.interpolation.HermiteAxis;
import org.convgrid.engine.state.Composition;

/**
 * Rosseland-mean opacity read from tables of log10 kappa on a grid of (log10 T, log10 R), R = rho/T6^3
 * (rho in g cm^-3, T6 = T/1e6 K), one table per composition (X, Z). All tables share one temperature grid and one
 * R grid; a node may be "not in table". The compositions need not fill an X x Z rectangle (the OPAL X = 1 - Z
 * tables do not).
 *
 * <p>Interpolation, one scheme throughout: piecewise-cubic Hermite with the parabolic node slopes of Steffen 1990
 * (A&amp;A 239, 443, eq. 6; {@link CubicHermite}), which reproduces every node exactly and is C1 between them.
 * Within a table in (log T, log R) as a tensor product. Across tables: the metal fraction axis is
 * zeta = log10(Z + {@value #METALS_OFFSET}), so Z = 0 is a node and the logarithmic spacing of the published Z
 * values is kept; at each tabulated Z the hydrogen axis is xi = X/(1 - Z), the hydrogen share of the non-metals,
 * which runs from 0 to 1 at every Z of the OPAL set and maps each table onto its own node. The value at (X, Z) is
 * sum_r w_r(zeta) sum_k w_rk(xi) f_rk: the weights depend only on the composition, so the log T and log R
 * derivatives (the Jacobian's) are the same weighted sums of the tables' analytic derivatives, and the weighted
 * node data are interpolated as one table. An axis with a single node is taken as constant along it. The
 * helium content of the request is implied (Y = 1 - X - Z), as are CNO changes at fixed Z.
 *
 * <p>No extrapolation: a request outside the (log T, log R) grid, outside the compositions, or in a cell where any
 * table it needs has a corner "not in table" fails with {@link ErrorKind#OFF_TABLE}; the parameters are the table
 * name, T (K), rho (g cm^-3), log10 T and log10 R (or the table name, X and Z for a composition off the table).
 * {@link OpalGn93Opacity} says what answers there for the default opacity. Text layout: see
 * {@link OpacityTableReader} and {@code TABLE-FORMAT.md}. Immutable and thread-safe; evaluation allocates only its
 * result, and a look-up at a {@link TableAtComposition} the corner sums of a cell it has not kept.
 */
public final class TabulatedOpacity implements Opacity {

    private static final double LN10 = Math.log(10.0);
    /** Requests this close (dex) outside an edge are moved onto it, so round-off at the grid ends is harmless. */
    public static final double EDGE_TOLERANCE = 1.0e-9;
    /** Offset of the metal axis zeta = log10(Z + offset), so that Z = 0 is a node. */
    public static final double METALS_OFFSET = 1.0e-4;
    /**
     * A metal fraction this close to a tabulated one in zeta = log10(Z + offset) is read from that Z alone. Why: a
     * trace counted in Z moves it off its node by far less, and off a node the Hermite weights of the neighbouring Z
     * are tiny but not zero, so every call summed four Z rows of tables instead of one: 7Li (~1e-8 by mass, counted in
     * Z) burning in a solar-type envelope moves zeta by ~2e-7 at Z = 0.02, and a Z 3e-10 (relative) off the node took
     * ~290 ns instead of ~230 ns a call (measured, thread CPU, at the rho and T of a 1 Msun envelope), at ~330 of the
     * 500 points of a 1 Msun main-sequence model from birth. The change of kappa is at most |d ln kappa/d zeta| times
     * this (a few 1e-6), far below the tables' own interpolation error; a real change of Z (CNO burning, settling,
     * another mixture) is many times larger and interpolated as before.
     */
    public static final double METALS_NODE_TOLERANCE = 1.0e-6;

    /** Result of {@link #interpolate}: answered. */
    static final int ANSWERED = 0;
    /** Result of {@link #interpolate}: log T or log R outside the grid. */
    static final int OUTSIDE_GRID = 1;
    /** Result of {@link #interpolate}: composition outside the tabulated ones. */
    static final int OUTSIDE_COMPOSITIONS = 2;
    /** Result of {@link #interpolate}: a needed cell has a corner not in table. */
    static final int NOT_IN_TABLE = 3;

    /** Most tables one composition can weigh: four metal rows of four hydrogen nodes. */
    private static final int MAX_STENCIL = HermiteAxis.STENCIL * HermiteAxis.STENCIL;
    private static final ThreadLocal<Scratch> SCRATCH = ThreadLocal.withInitial(Scratch::new);

    private final String name;
    private final double[] logT;
    private final double[] logR;
    private final double[] tableX;
    private final double[] tableZ;
    private final BicubicLogTable[] tables;
    /** Every table's node data one after the other (stride nodeStride), so the hot loop reads one array. */
    private final double[] nodeData;
    private final int nodeStride;
    /** Distinct Z of the tables, increasing, and zeta = log10(Z + offset) of each. */
    private final double[] metals;
    private final HermiteAxis zeta;
    /** Per metal row r: xi = X/(1 - Z) of its tables, increasing, and their indices. */
    private final HermiteAxis[] xi;
    private final int[][] rowTables;

    /**
     * @param name shown in error messages
     * @param hydrogen X of each table
     * @param metals Z of each table (same length; no composition twice; X + Z &lt;= 1)
     * @param logTemperatures log10 T grid, strictly increasing, &gt;= 2 points
     * @param logR log10 R grid, strictly increasing, &gt;= 2 points
     * @param logKappa logKappa[k][iT][iR], log10 of kappa in cm^2 g^-1 of table k; NaN where not in table
     */
    public TabulatedOpacity(String name, double[] hydrogen, double[] metals, double[] logTemperatures, double[] logR,
                            double[][][] logKappa) {
        this.name = Objects.requireNonNull(name);
        requireIncreasing("log T", logTemperatures, 2);
        requireIncreasing("log R", logR, 2);
        if (logKappa.length != hydrogen.length || metals.length != hydrogen.length || hydrogen.length == 0) {
            throw new ConvgridException(ErrorKind.BAD_DATA, name + ": need one (X, Z) per table, got "
                    + hydrogen.length + " X, " + metals.length + " Z, " + logKappa.length + " tables", name);
        }
        this.logT = logTemperatures.clone();
        this.logR = logR.clone();
        this.tableX = hydrogen.clone();
        this.tableZ = metals.clone();
        this.tables = new BicubicLogTable[logKappa.length];
        for (int k = 0; k < logKappa.length; k++) {
            requireComposition(k);
            if (logKappa[k].length != logT.length) {
                throw new ConvgridException(ErrorKind.BAD_DATA, name + ": table " + k + " has wrong number of rows",
                        name, k);
            }
            for (double[] row : logKappa[k]) {
                if (row.length != logR.length) {
                    throw new ConvgridException(ErrorKind.BAD_DATA, name + ": table " + k + " has a short row",
                            name, k);
                }
                for (double v : row) {
                    if (Double.isInfinite(v)) {
                        throw new ConvgridException(ErrorKind.BAD_DATA, name + ": infinite log kappa", name, k);
                    }
                }
            }
            tables[k] = new BicubicLogTable(this.logT, this.logR, logKappa[k]);
        }
        nodeStride = tables[0].nodeDataLength();
        nodeData = new double[nodeStride * tables.length];
        for (int k = 0; k < tables.length; k++) {
            tables[k].copyNodeData(nodeData, k * nodeStride);
        }
        TreeSet<Double> distinct = new TreeSet<>();
        for (double z : tableZ) {
            distinct.add(z);
        }
        this.metals = distinct.stream().mapToDouble(Double::doubleValue).toArray();
        this.zeta = new HermiteAxis(Arrays.stream(this.metals).map(z -> Math.log10(z + METALS_OFFSET)).toArray());
        this.xi = new HermiteAxis[this.metals.length];
        this.rowTables = new int[this.metals.length][];
        for (int r = 0; r < this.metals.length; r++) {
            List<Integer> members = new ArrayList<>();
            for (int k = 0; k < tableZ.length; k++) {
                if (tableZ[k] == this.metals[r]) {
                    members.add(k);
                }
            }
            members.sort((a, b) -> Double.compare(tableX[a], tableX[b]));
            rowTables[r] = members.stream().mapToInt(Integer::intValue).toArray();
            double[] shares = members.stream().mapToDouble(k -> hydrogenShare(tableX[k], tableZ[k])).toArray();
            for (int q = 1; q < shares.length; q++) {
                if (!(shares[q] > shares[q - 1])) {
                    throw new ConvgridException(ErrorKind.BAD_DATA, name + ": two tables for X = " + tableX[
                            rowTables[r][q]] + ", Z = " + this.metals[r], name);
                }
            }
            xi[r] = new HermiteAxis(shares);
        }
    }

    /** xi = X/(1 - Z), the interpolation variable in X (1 for pure metals, which no table has). */
    private static double hydrogenShare(double x, double z) {
        return z < 1.0 ? x / (1.0 - z) : 1.0;
    }

    /**
     * Tabulates any opacity at Composition.scaledSolar(X, Z) for every X x Z pair (every X + Z must be &lt;= 1).
     */
    public static TabulatedOpacity generate(Opacity source, List<Double> hydrogen, List<Double> metals,
                                            double[] logTemperatures, double[] logR) {
        int n = hydrogen.size() * metals.size();
        double[] xs = new double[n];
        double[] zs = new double[n];
        double[][][] values = new double[n][logTemperatures.length][logR.length];
        for (int ix = 0; ix < hydrogen.size(); ix++) {
            for (int iz = 0; iz < metals.size(); iz++) {
                int k = ix * metals.size() + iz;
                xs[k] = hydrogen.get(ix);
                zs[k] = metals.get(iz);
                Composition c = Composition.scaledSolar(xs[k], zs[k]);
                for (int i = 0; i < logTemperatures.length; i++) {
                    double t = Math.pow(10.0, logTemperatures[i]);
                    double t6 = t * 1e-6;
                    for (int j = 0; j < logR.length; j++) {
                        double rho = Math.pow(10.0, logR[j]) * t6 * t6 * t6;
                        values[k][i][j] = Math.log10(source.rosselandMean(rho, t, c).kappa());
                    }
                }
            }
        }
        return new TabulatedOpacity("generated from " + source.getClass().getSimpleName(), xs, zs,
                logTemperatures, logR, values);
    }

    @Override
    public OpacityValue rosselandMean(double density, double temperature, Composition composition) {
        double lt = Math.log10(temperature);
        double lr = Math.log10(density) - 3.0 * (lt - 6.0);
        double[] out = new double[3];
        int status = interpolate(lt, lr, composition.x(), composition.z(), out);
        if (status == OUTSIDE_COMPOSITIONS) {
            throw new ConvgridException(ErrorKind.OFF_TABLE, String.format(
                    "%s: composition X = %.4g, Z = %.4g is outside the tabulated compositions (Z %s)", name,
                    composition.x(), composition.z(), Arrays.toString(metals)), name, composition.x(),
                    composition.z());
        }
        if (status != ANSWERED) {
            throw new ConvgridException(ErrorKind.OFF_TABLE, String.format(
                    "%s: T = %.4g K, rho = %.4g g/cm^3 (log T = %.3f, log R = %.3f) is %s log T [%.3f, %.3f],"
                            + " log R [%.3f, %.3f]", name, temperature, density, lt, lr,
                    status == NOT_IN_TABLE ? "in a cell not in the table, inside" : "outside",
                    logT[0], last(logT), logR[0], last(logR)) + (status == OUTSIDE_GRID && lt < logT[0]
                    // the shipped OPAL file (from log T 3.75) given as a table of its own: every model
                    // failed at ~4600 K, in layers none of the final models has
                    ? "; nothing is extrapolated, so a table must reach the coolest layer any model visits, also on "
                    + "the way: atmospheres down to about 0.8 Teff, pre-main-sequence start models, and the 1 Msun "
                    + "model each zero-age mass line starts from (log T below 3.7; README, Opacity tables)" : ""),
                    name, temperature, density, lt, lr);
        }
        // log R = log rho - 3 log T + 18: d/dln rho = d/dlog R; d/dln T = d/dlog T - 3 d/dlog R
        return new OpacityValue(Math.exp(LN10 * out[0]), out[2], out[1] - 3.0 * out[2]);
    }

    /**
     * log10 kappa, d/dlog10 T at fixed R and d/dlog10 R at fixed T into out[0..2], or a reason why not
     * ({@link #OUTSIDE_GRID}, {@link #OUTSIDE_COMPOSITIONS}, {@link #NOT_IN_TABLE}; out is then unspecified).
     */
    int interpolate(double logTemperature, double logRValue, double x, double z, double[] out) {
        double lt = snap(logTemperature, logT);
        double lr = snap(logRValue, logR);
        if (!(lt >= logT[0] && lt <= last(logT) && lr >= logR[0] && lr <= last(logR))) {
            return OUTSIDE_GRID;
        }
        Scratch scratch = SCRATCH.get();
        int status = compositionStencil(x, z, scratch);
        if (status != ANSWERED) {
            return status;
        }
        int i = CubicHermite.cell(logT, lt);
        int j = CubicHermite.cell(logR, lr);
        if (!answers(scratch.tables, scratch.count, i, j)) {
            int edge = edgeCell(scratch.tables, scratch.count, lt, lr, i, j);
            if (edge < 0) {
                return NOT_IN_TABLE;
            }
            i = edge / logR.length;
            j = edge % logR.length;
        }
        sumCorners(scratch.tables, scratch.weights, scratch.count, i, j, scratch.corners);
        cellValue(scratch.corners, i, j, lt, lr, out);
        return ANSWERED;
    }

    /**
     * {@link #interpolate(double, double, double, double, double[])} at the composition of {@code at} (made by
     * {@link #atComposition} of this table): the same numbers, without the composition's weights (taken once) and,
     * while the requests stay in one cell, without its corner sums (kept by {@code at}).
     */
    int interpolate(double logTemperature, double logRValue, TableAtComposition at, double[] out) {
        double lt = snap(logTemperature, logT);
        double lr = snap(logRValue, logR);
        if (!(lt >= logT[0] && lt <= last(logT) && lr >= logR[0] && lr <= last(logR))) {
            return OUTSIDE_GRID;
        }
        if (at.status() != ANSWERED) {
            return at.status();
        }
        TableAtComposition.Cell kept = at.keptCell();
        // the kept cell when it holds the point: the binary search's answer there (g[i] <= v < g[i + 1] picks one
        // cell only; the last node, the one point of two cells, is left to the search)
        int i = kept != null && logT[kept.i()] <= lt && lt < logT[kept.i() + 1] ? kept.i() : CubicHermite.cell(logT, lt);
        int j = kept != null && logR[kept.j()] <= lr && lr < logR[kept.j() + 1] ? kept.j() : CubicHermite.cell(logR, lr);
        double[] corners;
        if (kept != null && kept.i() == i && kept.j() == j) {
            corners = kept.corners();
        } else {
            int[] stencil = at.tables();
            int count = stencil.length;
            boolean own = answers(stencil, count, i, j);
            if (!own) {
                int edge = edgeCell(stencil, count, lt, lr, i, j);
                if (edge < 0) {
                    return NOT_IN_TABLE;
                }
                i = edge / logR.length;
                j = edge % logR.length;
            }
            corners = new double[4 * BicubicLogTable.PER_NODE];
            sumCorners(stencil, at.weights(), count, i, j, corners);
            if (own) {
                // only a cell found by the search itself is kept: the cell below an edge is taken for points on
                // that edge alone
                at.keep(new TableAtComposition.Cell(i, j, corners));
            }
        }
        cellValue(corners, i, j, lt, lr, out);
        return ANSWERED;
    }

    /**
     * The tables' weights at composition (x, z), for many look-ups at it by {@link #interpolate(double, double,
     * TableAtComposition, double[])}; its status says whether the composition lies inside the tables.
     */
    TableAtComposition atComposition(double x, double z) {
        // through the per-thread scratch: no work space to allocate, and the weights need not be taken again when
        // the last composition looked up had the same (x, z), as neighbouring points of a mixed zone have
        Scratch scratch = SCRATCH.get();
        int status = compositionStencil(x, z, scratch);
        return new TableAtComposition(status, Arrays.copyOf(scratch.tables, scratch.count),
                Arrays.copyOf(scratch.weights, scratch.count));
    }

    /**
     * A point on a lower edge of cell (i, j), which does not answer, also belongs to the cell below: the one that
     * answers at the table's blank edge (so a node next to blank cells is still reproduced). That cell as
     * i * (number of log R nodes) + j, or -1 when there is none.
     */
    private int edgeCell(int[] stencil, int count, double lt, double lr, int i, int j) {
        boolean onT = i > 0 && lt == logT[i];
        boolean onR = j > 0 && lr == logR[j];
        if (onT && answers(stencil, count, i - 1, j)) {
            return (i - 1) * logR.length + j;
        } else if (onR && answers(stencil, count, i, j - 1)) {
            return i * logR.length + j - 1;
        } else if (onT && onR && answers(stencil, count, i - 1, j - 1)) {
            return (i - 1) * logR.length + j - 1;
        }
        return -1;
    }

    /** Value and slopes at (lt, lr) in cell (i, j) from its summed corner data into out[0..2]. */
    private void cellValue(double[] corners, int i, int j, double lt, double lr, double[] out) {
        double hT = logT[i + 1] - logT[i];
        double hR = logR[j + 1] - logR[j];
        CubicHermite.bicubic(corners, 0, 2 * BicubicLogTable.PER_NODE, (lt - logT[i]) / hT,
                (lr - logR[j]) / hR, hT, hR, out, 0);
    }

    /** Tables and weights of the composition (x, z) into scratch: sum_r w_r(zeta) w_rk(xi) per table. */
    private int compositionStencil(double x, double z, Scratch scratch) {
        // the solver asks many (rho, T) at one composition: the weights are a pure function of (x, z), so the
        // last ones are reused (per thread; the same answer as recomputing them)
        if (x == scratch.lastX && z == scratch.lastZ && scratch.owner == this) {
            return scratch.lastStatus;
        }
        scratch.owner = this;
        scratch.lastX = x;
        scratch.lastZ = z;
        scratch.lastStatus = weighCompositions(x, z, scratch);
        return scratch.lastStatus;
    }

    private int weighCompositions(double x, double z, Scratch scratch) {
        scratch.count = 0;
        double share = hydrogenShare(x, z);
        double zz = metalsCoordinate(z);
        if (!zeta.contains(zz) && zeta.size() > 1) {
            return OUTSIDE_COMPOSITIONS;
        }
        int zCell = zeta.cell(zz);
        int zFrom = zeta.stencilStart(zCell);
        zeta.weights(zCell, zz, scratch.axis, 0);
        for (int p = 0; p < zeta.stencilSize(); p++) {
            double wz = scratch.axis[p];
            if (wz == 0.0) {
                continue;
            }
            HermiteAxis g = xi[zFrom + p];
            double s = snap(share, g);
            if (!g.contains(s) && g.size() > 1) {
                return OUTSIDE_COMPOSITIONS;
            }
            int xCell = g.cell(s);
            int xFrom = g.stencilStart(xCell);
            g.weights(xCell, s, scratch.axis, HermiteAxis.STENCIL);
            for (int q = 0; q < g.stencilSize(); q++) {
                double w = wz * scratch.axis[HermiteAxis.STENCIL + q];
                if (w != 0.0) {
                    scratch.tables[scratch.count] = rowTables[zFrom + p][xFrom + q];
                    scratch.weights[scratch.count++] = w;
                }
            }
        }
        return ANSWERED;
    }

    private boolean answers(int[] stencil, int count, int i, int j) {
        for (int n = 0; n < count; n++) {
            if (!tables[stencil[n]].answers(i, j)) {
                return false;
            }
        }
        return true;
    }

    /** The weighted sum of the stencil tables' corner data of cell (i, j) into c[0..15]. */
    private void sumCorners(int[] stencil, double[] weights, int count, int i, int j, double[] c) {
        int k00 = BicubicLogTable.PER_NODE * (i * logR.length + j);
        int k10 = k00 + BicubicLogTable.PER_NODE * logR.length;
        double[] d = nodeData;
        double a0 = 0.0, a1 = 0.0, a2 = 0.0, a3 = 0.0, a4 = 0.0, a5 = 0.0, a6 = 0.0, a7 = 0.0;
        double b0 = 0.0, b1 = 0.0, b2 = 0.0, b3 = 0.0, b4 = 0.0, b5 = 0.0, b6 = 0.0, b7 = 0.0;
        for (int n = 0; n < count; n++) {
            double w = weights[n];
            int p = stencil[n] * nodeStride + k00;
            int q = stencil[n] * nodeStride + k10;
            a0 += w * d[p];
            a1 += w * d[p + 1];
            a2 += w * d[p + 2];
            a3 += w * d[p + 3];
            a4 += w * d[p + 4];
            a5 += w * d[p + 5];
            a6 += w * d[p + 6];
            a7 += w * d[p + 7];
            b0 += w * d[q];
            b1 += w * d[q + 1];
            b2 += w * d[q + 2];
            b3 += w * d[q + 3];
            b4 += w * d[q + 4];
            b5 += w * d[q + 5];
            b6 += w * d[q + 6];
            b7 += w * d[q + 7];
        }
        c[0] = a0;
        c[1] = a1;
        c[2] = a2;
        c[3] = a3;
        c[4] = a4;
        c[5] = a5;
        c[6] = a6;
        c[7] = a7;
        c[8] = b0;
        c[9] = b1;
        c[10] = b2;
        c[11] = b3;
        c[12] = b4;
        c[13] = b5;
        c[14] = b6;
        c[15] = b7;
    }

    /** Per-thread work space of {@link #interpolate}, so a look-up allocates nothing. */
    private static final class Scratch {
        final double[] corners = new double[4 * BicubicLogTable.PER_NODE];
        final double[] axis = new double[2 * HermiteAxis.STENCIL];
        final int[] tables = new int[MAX_STENCIL];
        final double[] weights = new double[MAX_STENCIL];
        int count;
        TabulatedOpacity owner;
        double lastX = Double.NaN;
        double lastZ = Double.NaN;
        int lastStatus;
    }

    /**
     * The largest log R up to which every table the composition needs answers at this log T (log T inside the
     * grid), or NaN when none answers at the smallest log R; the table's own right edge where it has blank cells.
     */
    double answeredLogRLimit(double logTemperature, double x, double z) {
        int i = CubicHermite.cell(logT, snap(logTemperature, logT));
        int columns = logR.length - 1;
        double share = hydrogenShare(x, z);
        double zz = metalsCoordinate(z);
        double[] wz = new double[HermiteAxis.STENCIL];
        double[] wx = new double[HermiteAxis.STENCIL];
        int zCell = zeta.cell(zz);
        zeta.weights(zCell, zz, wz, 0);
        for (int p = 0; p < zeta.stencilSize(); p++) {
            int r = zeta.stencilStart(zCell) + p;
            if (wz[p] == 0.0) {
                continue;
            }
            double s = snap(share, xi[r]);
            int xCell = xi[r].cell(s);
            xi[r].weights(xCell, s, wx, 0);
            for (int q = 0; q < xi[r].stencilSize(); q++) {
                if (wx[q] != 0.0) {
                    columns = Math.min(columns, tables[rowTables[r][xi[r].stencilStart(xCell) + q]]
                            .answeredColumns(i));
                }
            }
        }
        return columns == 0 ? Double.NaN : logR[columns];
    }

    /** Z clamped into [Z_min, Z_max] of the tables. */
    /**
     * The distinct Z of the tables that composition (x, z) is interpolated from, increasing: one when z is a tabulated
     * Z, up to four between them; empty when the composition lies outside the tables. For a reader who asks which
     * tables answered (probe); the look-ups themselves do not call it.
     */
    double[] metalsWeighed(double x, double z) {
        Scratch scratch = new Scratch();
        if (weighCompositions(x, z, scratch) != ANSWERED) {
            return new double[0];
        }
        TreeSet<Double> used = new TreeSet<>();
        for (int n = 0; n < scratch.count; n++) {
            used.add(tableZ[scratch.tables[n]]);
        }
        return used.stream().mapToDouble(Double::doubleValue).toArray();
    }

    double clampMetals(double z) {
        return Math.min(Math.max(z, metals[0]), last(metals));
    }

    /**
     * X moved so that X/(1 - Z) lies in the range every table row needed at Z (Z inside the tables' span) covers;
     * X itself when it already does.
     */
    double clampHydrogen(double x, double z) {
        double share = hydrogenShare(x, z);
        double lo = Double.NEGATIVE_INFINITY;
        double hi = Double.POSITIVE_INFINITY;
        int from = zeta.stencilStart(zeta.cell(Math.log10(z + METALS_OFFSET)));
        for (int r = from; r < from + zeta.stencilSize(); r++) {
            lo = Math.max(lo, xi[r].node(0));
            hi = Math.min(hi, xi[r].node(xi[r].size() - 1));
        }
        return share >= lo && share <= hi ? x : Math.min(Math.max(share, lo), hi) * (1.0 - z);
    }

    private void requireComposition(int k) {
        double x = tableX[k];
        double z = tableZ[k];
        if (!(x >= 0.0 && z >= 0.0 && x + z <= 1.0 + 1e-9)) {
            throw new ConvgridException(ErrorKind.BAD_DATA, name + ": table " + k + " has X = " + x + ", Z = " + z
                    + "; need X, Z >= 0 and X + Z <= 1", name, k);
        }
    }

    private void requireIncreasing(String what, double[] g, int min) {
        boolean ok = g.length >= min;
        for (int i = 1; ok && i < g.length; i++) {
            ok = g[i] > g[i - 1];
        }
        for (int i = 0; ok && i < g.length; i++) {
            ok = Double.isFinite(g[i]);
        }
        if (!ok) {
            throw new ConvgridException(ErrorKind.BAD_DATA, name + ": " + what
                    + " grid must be finite, strictly increasing, with at least " + min + " values", name, what);
        }
    }

    /** zeta of Z, moved onto the grid's edge or a node within {@link #METALS_NODE_TOLERANCE} of it. */
    private double metalsCoordinate(double z) {
        double zz = snap(Math.log10(Math.max(z, 0.0) + METALS_OFFSET), zeta);
        if (zeta.size() > 1 && zeta.contains(zz)) {
            int cell = zeta.cell(zz);
            for (int k = cell; k <= cell + 1 && k < zeta.size(); k++) {
                if (Math.abs(zz - zeta.node(k)) <= METALS_NODE_TOLERANCE) {
                    return zeta.node(k);
                }
            }
        }
        return zz;
    }

    private static double snap(double v, HermiteAxis axis) {
        double first = axis.node(0);
        double end = axis.node(axis.size() - 1);
        if (v < first && v > first - EDGE_TOLERANCE) {
            return first;
        }
        return v > end && v < end + EDGE_TOLERANCE ? end : v;
    }

    private static double snap(double v, double[] grid) {
        if (v < grid[0] && v > grid[0] - EDGE_TOLERANCE) {
            return grid[0];
        }
        double end = last(grid);
        return v > end && v < end + EDGE_TOLERANCE ? end : v;
    }

    private static double last(double[] g) {
        return g[g.length - 1];
    }

    /** Table name, as used in error messages. */
    public String name() {
        return name;
    }

    /** Number of tables (compositions). */
    public int tableCount() {
        return tables.length;
    }

    /** X of table k. */
    public double hydrogen(int k) {
        return tableX[k];
    }

    /** Z of table k. */
    public double metals(int k) {
        return tableZ[k];
    }

    /** Distinct X of the tables, increasing. */
    public double[] hydrogenFractions() {
        return Arrays.stream(tableX).distinct().sorted().toArray();
    }

    /** Distinct Z of the tables, increasing. */
    public double[] metallicities() {
        return metals.clone();
    }

    public double[] logTemperatures() {
        return logT.clone();
    }

    public double[] logR() {
        return logR.clone();
    }

    /** Tabulated log10 kappa of table k at node (iT, iR); NaN when not in table. */
    public double logKappa(int k, int iT, int iR) {
        return tables[k].node(iT, iR);
    }
}
