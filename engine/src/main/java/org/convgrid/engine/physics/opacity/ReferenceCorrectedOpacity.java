package org.convgrid.engine.physics.opacity;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Objects;
import org.convgrid.engine.error.ConvgridException;
import org.convgrid.engine.error.ErrorKind;
import org.convgrid.engine.state.Composition;

/**
 * An opacity pulled onto published Rosseland-mean tables: kappa = kappa_base x 10^c, where the correction c(log T,
 * log R, X) is log10(kappa_table / kappa_base) at the table nodes, interpolated by cubic Hermite in (log T, log R)
 * and linearly in X between the reference tables (constant beyond them). At the nodes of a reference table and at
 * its composition the result is the table; elsewhere the base model supplies the dependence on density,
 * temperature and composition.
 *
 * <p>Why: the analytic composite ({@link AnalyticCompositeOpacity}) misses metal and hydrogen lines by 0.1-0.3 dex
 * at the base of solar-type convective envelopes and overshoots by up to 0.8 dex in dense 1e4-1e5 K gas; the
 * envelope depth, the radius and so the calibrated mixing length follow these errors directly.
 *
 * <p>Limits, stated as they are: the reference tables are OPAL GN93 at Z = 0.02 only (Iglesias &amp; Rogers 1996,
 * tables for X = 0.70 over 3.75 &lt;= log T &lt;= 8.0 and X = 0.35 over 6.0 &lt;= log T &lt;= 7.5, -8 &lt;= log R
 * &lt;= 1). The same correction is applied at every Z, so away from Z = 0.02 it is an extrapolation whose error is
 * unmeasured (at most the size of the correction, 0.1-0.4 dex in most of the table). Below log T = 3.75 the
 * correction fades to zero by log T = 3.70 and above log R = 1 by log R = 1.5 (smooth steps), so the base model
 * alone answers in cool, dense M-dwarf atmospheres. Outside the table in log T above 8 or log R below -8 the
 * edge value is used (it is under 0.02 dex there). Missing table entries (the OPAL "9.999") take the nearest
 * entry of their row at lower R.
 *
 * <p>Immutable and thread-safe.
 */
public final class ReferenceCorrectedOpacity implements Opacity {

    /** Classpath resource of the OPAL GN93 X = 0.70, Z = 0.02 table window. */
    public static final String OPAL_GN93_X070 = "/reference/opacity/opal-gn93-x070-z002.txt";
    /** Classpath resource of the OPAL GN93 X = 0.35, Z = 0.02 table window. */
    public static final String OPAL_GN93_X035 = "/reference/opacity/opal-gn93-x035-z002.txt";
    /** Metal mass fraction of both reference tables. */
    public static final double REFERENCE_Z = 0.02;
    /** The correction is full above this log T and zero below {@link #FADE_LOG_T_LOW}. */
    public static final double FADE_LOG_T_HIGH = 3.75;
    /** See {@link #FADE_LOG_T_HIGH}. */
    public static final double FADE_LOG_T_LOW = 3.70;
    /** The correction is full below this log R and zero above {@link #FADE_LOG_R_HIGH}. */
    public static final double FADE_LOG_R_LOW = 1.0;
    /** See {@link #FADE_LOG_R_LOW}. */
    public static final double FADE_LOG_R_HIGH = 1.5;

    private static final double MISSING = 9.0;

    private final Opacity base;
    private final double lowHydrogen;
    private final double highHydrogen;
    private final BicubicLogTable lowHydrogenCorrection;
    private final BicubicLogTable highHydrogenCorrection;
    private final double minLogT;
    private final double maxLogT;
    private final double minLogR;
    private final double maxLogR;

    private ReferenceCorrectedOpacity(Opacity base, double lowHydrogen, BicubicLogTable low, double highHydrogen,
                                      BicubicLogTable high) {
        this.base = base;
        this.lowHydrogen = lowHydrogen;
        this.highHydrogen = highHydrogen;
        this.lowHydrogenCorrection = low;
        this.highHydrogenCorrection = high;
        double[] xs = high.xs();
        double[] ys = high.ys();
        this.minLogT = xs[0];
        this.maxLogT = xs[xs.length - 1];
        this.minLogR = ys[0];
        this.maxLogR = ys[ys.length - 1];
    }

    /**
     * The base opacity corrected to the OPAL GN93 Z = 0.02 tables shipped with the engine.
     *
     * @throws ConvgridException BAD_DATA when a shipped table cannot be read (a broken build)
     */
    public static ReferenceCorrectedOpacity opalGn93(Opacity base) {
        Objects.requireNonNull(base);
        ReferenceTable high = ReferenceTable.read(OPAL_GN93_X070);
        ReferenceTable low = ReferenceTable.read(OPAL_GN93_X035);
        double[][] highCorrection = high.correction(base, 0.70, REFERENCE_Z, null);
        double[][] lowCorrection = low.embeddedIn(high).correction(base, 0.35, REFERENCE_Z, highCorrection);
        return new ReferenceCorrectedOpacity(base, 0.35, new BicubicLogTable(high.logT, high.logR, lowCorrection),
                0.70, new BicubicLogTable(high.logT, high.logR, highCorrection));
    }

    /** log10(kappa/kappa_base) at this point and composition (0 where the correction has faded out). */
    public double correctionDex(double density, double temperature, Composition composition) {
        return correction(Math.log10(temperature), Math.log10(density), composition.x())[0];
    }

    @Override
    public OpacityValue rosselandMean(double density, double temperature, Composition composition) {
        OpacityValue v = base.rosselandMean(density, temperature, composition);
        double[] c = correction(Math.log10(temperature), Math.log10(density), composition.x());
        // c is in dex; d log10 kappa / d log10 x = d ln kappa / d ln x, and log R = log rho - 3 log T + 18
        return new OpacityValue(v.kappa() * Math.pow(10.0, c[0]), v.dlnKappaDlnRho() + c[2],
                v.dlnKappaDlnT() + c[1] - 3.0 * c[2]);
    }

    /** {value, d/dlog T at fixed log R, d/dlog R at fixed log T} of the faded correction. */
    private double[] correction(double logT, double logRho, double hydrogen) {
        double logR = logRho - 3.0 * logT + 18.0;
        double[] tFade = smoothStep(logT, FADE_LOG_T_LOW, FADE_LOG_T_HIGH);
        double[] rFade = smoothStep(-logR, -FADE_LOG_R_HIGH, -FADE_LOG_R_LOW);
        double weight = tFade[0] * rFade[0];
        if (weight == 0.0) {
            return new double[] {0.0, 0.0, 0.0};
        }
        double ct = Math.min(Math.max(logT, minLogT), maxLogT);
        double cr = Math.min(Math.max(logR, minLogR), maxLogR);
        double[] out = new double[6];
        highHydrogenCorrection.evaluate(ct, cr, out, 0);
        lowHydrogenCorrection.evaluate(ct, cr, out, 3);
        double s = (Math.min(Math.max(hydrogen, lowHydrogen), highHydrogen) - lowHydrogen)
                / (highHydrogen - lowHydrogen);
        double value = out[3] + s * (out[0] - out[3]);
        double dT = ct == logT ? out[4] + s * (out[1] - out[4]) : 0.0;
        double dR = cr == logR ? out[5] + s * (out[2] - out[5]) : 0.0;
        // fades: d(rFade)/dlogR = -rFade'(-logR)
        return new double[] {weight * value,
                weight * dT + tFade[1] * rFade[0] * value,
                weight * dR - tFade[0] * rFade[1] * value};
    }

    /** C1 step: 0 below lo, 1 above hi, 3u^2 - 2u^3 between; returns {value, derivative}. */
    static double[] smoothStep(double x, double lo, double hi) {
        if (x <= lo) {
            return new double[] {0.0, 0.0};
        }
        if (x >= hi) {
            return new double[] {1.0, 0.0};
        }
        double u = (x - lo) / (hi - lo);
        return new double[] {u * u * (3.0 - 2.0 * u), 6.0 * u * (1.0 - u) / (hi - lo)};
    }

    /** One published table window: rows of log10 kappa on (log T, log R); NaN where the table has 9.999. */
    private record ReferenceTable(String name, double[] logT, double[] logR, double[][] logKappa) {

        static ReferenceTable read(String resource) {
            InputStream in = ReferenceCorrectedOpacity.class.getResourceAsStream(resource);
            if (in == null) {
                throw new ConvgridException(ErrorKind.BAD_DATA, "missing opacity reference table " + resource,
                        resource);
            }
            List<double[]> rows = new ArrayList<>();
            double[] logR = null;
            try (BufferedReader reader = new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8))) {
                String line;
                while ((line = reader.readLine()) != null) {
                    line = line.trim();
                    if (line.isEmpty() || line.startsWith("#")) {
                        continue;
                    }
                    String[] parts = line.split("\\s+");
                    double[] values = new double[parts[0].equals("logT") ? parts.length - 1 : parts.length];
                    int offset = parts.length - values.length;
                    for (int i = 0; i < values.length; i++) {
                        values[i] = Double.parseDouble(parts[i + offset]);
                    }
                    if (offset == 1) {
                        logR = values;
                    } else {
                        rows.add(values);
                    }
                }
            } catch (IOException | NumberFormatException e) {
                throw new ConvgridException(ErrorKind.BAD_DATA, "cannot read opacity reference table " + resource
                        + ": " + e.getMessage(), resource);
            }
            if (logR == null || rows.size() < 2) {
                throw new ConvgridException(ErrorKind.BAD_DATA, "opacity reference table " + resource
                        + " has no header or too few rows", resource);
            }
            double[] logT = new double[rows.size()];
            double[][] logKappa = new double[rows.size()][logR.length];
            for (int i = 0; i < rows.size(); i++) {
                double[] row = rows.get(i);
                if (row.length != logR.length + 1) {
                    throw new ConvgridException(ErrorKind.BAD_DATA, "opacity reference table " + resource
                            + ": row " + (i + 1) + " has " + (row.length - 1) + " entries, header " + logR.length,
                            resource, i + 1);
                }
                logT[i] = row[0];
                for (int j = 0; j < logR.length; j++) {
                    logKappa[i][j] = row[j + 1] > MISSING ? Double.NaN : row[j + 1];
                }
            }
            return new ReferenceTable(resource, logT, logR, logKappa);
        }

        /** This window on the wider table's grid: rows it lacks are NaN (filled later from the wider table). */
        ReferenceTable embeddedIn(ReferenceTable wider) {
            if (!Arrays.equals(logR, wider.logR)) {
                throw new ConvgridException(ErrorKind.BAD_DATA, name + ": log R grid differs from " + wider.name,
                        name);
            }
            double[][] values = new double[wider.logT.length][logR.length];
            for (int i = 0; i < wider.logT.length; i++) {
                Arrays.fill(values[i], Double.NaN);
                for (int k = 0; k < logT.length; k++) {
                    if (Math.abs(logT[k] - wider.logT[i]) < 1e-9) {
                        values[i] = logKappa[k].clone();
                    }
                }
            }
            return new ReferenceTable(name, wider.logT, logR, values);
        }

        /**
         * log10(kappa_table/kappa_base) at every node for Composition.scaledSolar(x, z); where this table has no
         * row the fallback's value is used, and a missing entry takes its row's nearest entry at lower R.
         */
        double[][] correction(Opacity base, double x, double z, double[][] fallback) {
            Composition composition = Composition.scaledSolar(x, z);
            double[][] c = new double[logT.length][logR.length];
            for (int i = 0; i < logT.length; i++) {
                double temperature = Math.pow(10.0, logT[i]);
                boolean rowPresent = !Double.isNaN(logKappa[i][0]);
                double last = 0.0;
                for (int j = 0; j < logR.length; j++) {
                    if (!rowPresent && fallback != null) {
                        c[i][j] = fallback[i][j];
                        continue;
                    }
                    if (Double.isNaN(logKappa[i][j])) {
                        c[i][j] = last;
                        continue;
                    }
                    double density = Math.pow(10.0, logR[j] + 3.0 * logT[i] - 18.0);
                    c[i][j] = logKappa[i][j] - Math.log10(base.rosselandMean(density, temperature, composition)
                            .kappa());
                    last = c[i][j];
                }
            }
            return c;
        }
    }
}
