package org.convgrid.engine.physics.opacity;

import java.util.List;
import java.util.Objects;
import org.convgrid.engine.error.ConvgridException;
import org.convgrid.engine.error.ErrorKind;
import org.convgrid.engine.state.Composition;

/**
 * Rosseland-mean opacity read from tables of log10 kappa on a grid of (log10 T, log10 R), R = rho/T6^3
 * (rho in g cm^-3, T6 = T/1e6 K), one table per (X, Z) on a rectangular grid of hydrogen and metal mass
 * fractions. All tables share one temperature grid and one R grid.
 *
 * <p>Within a table: tensor-product cubic Hermite interpolation with finite-difference node slopes, so log kappa
 * and its first derivatives are continuous. Between tables: log10 kappa and its derivatives are interpolated
 * linearly in X and in Z (bilinear on the four surrounding tables); a composition axis holding a single value is
 * taken as constant along that axis. The helium content of the request is ignored (Y = 1 - X - Z is implied),
 * as are CNO changes at fixed Z. A request outside the grids fails with {@link ErrorKind#OFF_TABLE}; the
 * parameters are the table name, T (K), rho (g cm^-3), log10 T and log10 R (or the table name, X and Z for a
 * composition off the table). Text layout: see {@link OpacityTableReader} and {@code TABLE-FORMAT.md}.
 * Immutable and thread-safe; evaluation allocates only its result and a small scratch array.
 */
public final class TabulatedOpacity implements Opacity {

    private static final double LN10 = Math.log(10.0);
    /** Requests this close (dex) outside an edge are moved onto it, so round-off at the grid ends is harmless. */
    public static final double EDGE_TOLERANCE = 1.0e-9;

    private final String name;
    private final double[] hydrogen;
    private final double[] metals;
    private final BicubicLogTable[] tables;

    /**
     * @param name shown in error messages
     * @param hydrogen X values, strictly increasing
     * @param metals Z values, strictly increasing
     * @param logTemperatures log10 T grid, strictly increasing, &gt;= 2 points
     * @param logR log10 R grid, strictly increasing, &gt;= 2 points
     * @param logKappa logKappa[ix * metals.length + iz][iT][iR], log10 of kappa in cm^2 g^-1
     */
    public TabulatedOpacity(String name, double[] hydrogen, double[] metals, double[] logTemperatures, double[] logR,
                            double[][][] logKappa) {
        this.name = Objects.requireNonNull(name);
        requireIncreasing("X", hydrogen, 1);
        requireIncreasing("Z", metals, 1);
        requireIncreasing("log T", logTemperatures, 2);
        requireIncreasing("log R", logR, 2);
        if (logKappa.length != hydrogen.length * metals.length) {
            throw new ConvgridException(ErrorKind.BAD_DATA, name + ": need one table per (X, Z), expected "
                    + hydrogen.length * metals.length + " got " + logKappa.length, name);
        }
        this.hydrogen = hydrogen.clone();
        this.metals = metals.clone();
        this.tables = new BicubicLogTable[logKappa.length];
        for (int k = 0; k < logKappa.length; k++) {
            if (logKappa[k].length != logTemperatures.length) {
                throw new ConvgridException(ErrorKind.BAD_DATA, name + ": table " + k + " has wrong number of rows",
                        name, k);
            }
            for (double[] row : logKappa[k]) {
                if (row.length != logR.length) {
                    throw new ConvgridException(ErrorKind.BAD_DATA, name + ": table " + k + " has a short row",
                            name, k);
                }
                for (double v : row) {
                    if (!Double.isFinite(v)) {
                        throw new ConvgridException(ErrorKind.BAD_DATA, name + ": non-finite log kappa", name, k);
                    }
                }
            }
            tables[k] = new BicubicLogTable(logTemperatures, logR, logKappa[k]);
        }
    }

    /**
     * Tabulates any opacity at Composition.scaledSolar(X, Z) on the given grids (every X + Z must be &lt;= 1).
     */
    public static TabulatedOpacity generate(Opacity source, List<Double> hydrogen, List<Double> metals,
                                            double[] logTemperatures, double[] logR) {
        double[] xs = hydrogen.stream().mapToDouble(Double::doubleValue).toArray();
        double[] zs = metals.stream().mapToDouble(Double::doubleValue).toArray();
        double[][][] values = new double[xs.length * zs.length][logTemperatures.length][logR.length];
        for (int ix = 0; ix < xs.length; ix++) {
            for (int iz = 0; iz < zs.length; iz++) {
                Composition c = Composition.scaledSolar(xs[ix], zs[iz]);
                for (int i = 0; i < logTemperatures.length; i++) {
                    double t = Math.pow(10.0, logTemperatures[i]);
                    double t6 = t * 1e-6;
                    for (int j = 0; j < logR.length; j++) {
                        double rho = Math.pow(10.0, logR[j]) * t6 * t6 * t6;
                        values[ix * zs.length + iz][i][j] = Math.log10(source.rosselandMean(rho, t, c).kappa());
                    }
                }
            }
        }
        return new TabulatedOpacity("generated from " + source.getClass().getSimpleName(), xs, zs,
                logTemperatures, logR, values);
    }

    @Override
    public OpacityValue rosselandMean(double density, double temperature, Composition composition) {
        double logT = Math.log10(temperature);
        double logR = Math.log10(density) - 3.0 * (logT - 6.0);
        logT = snap(logT, tables[0].xs());
        logR = snap(logR, tables[0].ys());
        if (!tables[0].contains(logT, logR)) {
            throw new ConvgridException(ErrorKind.OFF_TABLE, String.format(
                    "%s: T = %.4g K, rho = %.4g g/cm^3 (log T = %.3f, log R = %.3f) is outside log T [%.3f, %.3f],"
                            + " log R [%.3f, %.3f]", name, temperature, density, logT, logR,
                    tables[0].xs()[0], last(tables[0].xs()), tables[0].ys()[0], last(tables[0].ys())),
                    name, temperature, density, logT, logR);
        }
        double x = composition.x();
        double z = composition.z();
        int ix = bracket(hydrogen, x, composition);
        int iz = bracket(metals, z, composition);
        double wx = weight(hydrogen, ix, x);
        double wz = weight(metals, iz, z);
        double[] s = new double[3];
        double value = 0.0;
        double dT = 0.0;
        double dR = 0.0;
        for (int a = 0; a < 2; a++) {
            double w1 = a == 0 ? 1.0 - wx : wx;
            if (w1 == 0.0) {
                continue;
            }
            for (int b = 0; b < 2; b++) {
                double w = w1 * (b == 0 ? 1.0 - wz : wz);
                if (w == 0.0) {
                    continue;
                }
                int k = Math.min(ix + a, hydrogen.length - 1) * metals.length + Math.min(iz + b, metals.length - 1);
                tables[k].evaluate(logT, logR, s, 0);
                value += w * s[0];
                dT += w * s[1];
                dR += w * s[2];
            }
        }
        // log R = log rho - 3 log T + 18: d/dln rho = d/dlog R; d/dln T = d/dlog T - 3 d/dlog R
        return new OpacityValue(Math.exp(LN10 * value), dR, dT - 3.0 * dR);
    }

    private int bracket(double[] grid, double v, Composition composition) {
        if (grid.length == 1) {
            return 0;
        }
        if (!(v >= grid[0] && v <= last(grid))) {
            throw new ConvgridException(ErrorKind.OFF_TABLE, String.format(
                    "%s: composition X = %.4g, Z = %.4g is outside the tabulated X %s, Z %s", name, composition.x(),
                    composition.z(), java.util.Arrays.toString(hydrogen), java.util.Arrays.toString(metals)),
                    name, composition.x(), composition.z());
        }
        int i = 0;
        while (i < grid.length - 2 && grid[i + 1] <= v) {
            i++;
        }
        return i;
    }

    private static double weight(double[] grid, int i, double v) {
        return grid.length == 1 ? 0.0 : (v - grid[i]) / (grid[i + 1] - grid[i]);
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

    public double[] hydrogenFractions() {
        return hydrogen.clone();
    }

    public double[] metallicities() {
        return metals.clone();
    }

    public double[] logTemperatures() {
        return tables[0].xs().clone();
    }

    public double[] logR() {
        return tables[0].ys().clone();
    }

    /** Tabulated log10 kappa of table (ix, iz) at node (iT, iR). */
    public double logKappa(int ix, int iz, int iT, int iR) {
        return tables[ix * metals.length + iz].node(iT, iR);
    }
}
