package org.convgrid.engine.physics.opacity;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.Objects;
import org.convgrid.engine.state.Composition;

/**
 * One set of radiative log kappa tables with the analytic radiative terms joined beyond its edges: inside the tables
 * the table itself; outside, the analytic terms plus the table-minus-analytic offset (dex) taken at the nearest
 * point where the table answers, faded out with the distance d from it as 1 - 3u^2 + 2u^3, u = d/width (width
 * {@code coolWidth} below the coolest row, {@code denseWidth} above the highest log R, {@code edgeWidth} beyond the
 * other edges), so that the result is continuous in value and the analytic terms alone answer beyond the fades; an
 * infinite width holds the offset (the analytic terms' slope, the table's level). A composition outside the tables
 * (Z beyond their Z range, or X/(1-Z) beyond a row's range) is moved to the nearest tabulated one for the table
 * part. Inside a blank corner the edge is taken per table row in log T, so the join is continuous in log R but can
 * step across log T rows there. Immutable and thread-safe.
 */
final class AnalyticallyEdgedTable {

    private final TabulatedOpacity table;
    private final String label;
    private final Opacity analyticRadiative;
    private final double coolWidth;
    private final double edgeWidth;
    private final double denseWidth;
    private final double minLogT;
    private final double maxLogT;
    private final double minLogR;
    private final double maxLogR;

    /**
     * @param table radiative log kappa tables
     * @param label what {@link #source} calls the table (its file's name)
     * @param analyticRadiative answers where the table does not (radiative only)
     * @param coolWidth fade width (dex in log T) below the coolest row
     * @param edgeWidth fade width (dex) beyond the other edges
     * @param denseWidth fade width (dex in log R) above the highest log R; infinite to hold the offset there
     */
    AnalyticallyEdgedTable(TabulatedOpacity table, String label, Opacity analyticRadiative, double coolWidth,
                           double edgeWidth, double denseWidth) {
        this.table = Objects.requireNonNull(table);
        this.label = Objects.requireNonNull(label);
        this.analyticRadiative = Objects.requireNonNull(analyticRadiative);
        this.coolWidth = coolWidth;
        this.edgeWidth = edgeWidth;
        this.denseWidth = denseWidth;
        double[] t = table.logTemperatures();
        double[] r = table.logR();
        minLogT = t[0];
        maxLogT = t[t.length - 1];
        minLogR = r[0];
        maxLogR = r[r.length - 1];
    }

    TabulatedOpacity table() {
        return table;
    }

    /**
     * log10 kappa_rad, d/dlog10 T at fixed R and d/dlog10 R at fixed T into out[0..2], at (log T, log R) =
     * (lt, lr) of (density, temperature).
     */
    void logKappa(double density, double temperature, Composition composition, double lt, double lr,
                  double[] out) {
        double x = composition.x();
        double z = composition.z();
        int status = table.interpolate(lt, lr, x, z, out);
        if (status == TabulatedOpacity.OUTSIDE_COMPOSITIONS) {
            z = table.clampMetals(z);
            x = tableHydrogen(composition, z);
            status = table.interpolate(lt, lr, x, z, out);
        }
        if (status == TabulatedOpacity.ANSWERED) {
            return;
        }
        OpacityValue a = analyticRadiative.rosselandMean(density, temperature, composition);
        out[0] = Math.log10(a.kappa());
        out[2] = a.dlnKappaDlnRho();
        out[1] = a.dlnKappaDlnT() + 3.0 * out[2];
        if (!beyondEveryFade(lt, lr)) {
            addFadedOffset(composition, lt, lr, x, z, out);
        }
    }

    /**
     * The table's weights at this composition, moved into the tables as {@link #logKappa} moves it when it lies
     * outside them.
     */
    TableAtComposition atComposition(Composition composition) {
        TableAtComposition at = table.atComposition(composition.x(), composition.z());
        if (at.status() == TabulatedOpacity.OUTSIDE_COMPOSITIONS) {
            double z = table.clampMetals(composition.z());
            at = table.atComposition(tableHydrogen(composition, z), z);
        }
        return at;
    }

    /**
     * {@link #logKappa(double, double, Composition, double, double, double[])} with the composition's weights taken
     * once ({@code at}, from {@link #atComposition} of this composition): the same numbers. Where the table does not
     * answer, the join is made as there.
     */
    void logKappa(double density, double temperature, Composition composition, TableAtComposition at, double lt,
                  double lr, double[] out) {
        if (table.interpolate(lt, lr, at, out) != TabulatedOpacity.ANSWERED) {
            logKappa(density, temperature, composition, lt, lr, out);
        }
    }

    /** Whether the tables themselves answer at (log10 T, log10 R) for this composition (no analytic join). */
    boolean answers(double logT, double logR, Composition composition) {
        double z = table.clampMetals(composition.z());
        return table.interpolate(logT, logR, tableHydrogen(composition, z), z, new double[3])
                == TabulatedOpacity.ANSWERED;
    }

    /**
     * What answers at (log10 T, log10 R) for this composition, in words for a reader: the table file and the Z of the
     * tables interpolated ("opal-gn93hz.txt at Z 0.01/0.02/0.03/0.04"), "analytic terms joined to" it in the fades,
     * "analytic terms" alone beyond them. A composition outside the tables is moved into them as {@link #logKappa}
     * moves it, and said so.
     */
    String source(double logT, double logR, Composition composition) {
        if (beyondEveryFade(logT, logR)) {
            return "analytic terms";
        }
        double[] weighed = table.metalsWeighed(composition.x(), composition.z());
        boolean moved = weighed.length == 0;
        if (moved) {
            double z = table.clampMetals(composition.z());
            weighed = table.metalsWeighed(tableHydrogen(composition, z), z);
        }
        StringBuilder tables = new StringBuilder(label).append(" at Z ");
        for (int r = 0; r < weighed.length; r++) {
            tables.append(r == 0 ? "" : "/").append(plain(weighed[r]));
        }
        if (moved) {
            tables.append(" (nearest tabulated composition)");
        } else if (weighed.length > 1) {
            // the Z between the rows: CN burning adds metals (Z 0.02 at 1e7 K is 0.02000x), so a round Z asked for
            // can still weigh its neighbours
            tables.append(" (interpolated to Z ").append(plain(new BigDecimal(composition.z())
                    .round(new MathContext(6)).doubleValue())).append(')');
        }
        return answers(logT, logR, composition) ? tables.toString() : "analytic terms joined to " + tables;
    }

    /** A metal fraction as written, without an exponent or trailing zeros: 0.0001, 0.02, 0. */
    private static String plain(double z) {
        return BigDecimal.valueOf(z).stripTrailingZeros().toPlainString();
    }

    /** X for the table part at table metals z: the request's hydrogen share X/(1-Z), moved into the tables. */
    private double tableHydrogen(Composition composition, double z) {
        double x = composition.x();
        if (z != composition.z()) {
            x *= (1.0 - z) / (1.0 - composition.z());
        }
        return table.clampHydrogen(x, z);
    }

    /**
     * Adds to out (the analytic terms) the faded offset to the nearest answering table point. A composition outside
     * the tables is moved into them for it, as inside the grid: (log T, log R) beyond the grid is reported before the
     * composition is checked, so x and z may still be the request's here, and a Z a few ulp below the lowest
     * tabulated Z (a Z = 1e-4 envelope whose 7Li, counted in Z, burns) lost the held offset above log R = +1, a
     * 1 dex drop of kappa with the last bits of Z.
     */
    private void addFadedOffset(Composition composition, double lt, double lr, double x, double z, double[] out) {
        double tc = Math.min(Math.max(lt, minLogT), maxLogT);
        double rGrid = Math.min(Math.max(lr, minLogR), maxLogR);
        double[] edge = new double[4];
        int status = edgePoint(tc, rGrid, x, z, edge);
        double zc = table.clampMetals(z);
        if (status == TabulatedOpacity.OUTSIDE_COMPOSITIONS || status != TabulatedOpacity.ANSWERED && zc != z) {
            status = edgePoint(tc, rGrid, tableHydrogen(composition, zc), zc, edge);
        }
        if (status != TabulatedOpacity.ANSWERED) {
            return;
        }
        double rc = edge[3];
        OpacityValue ae = analyticRadiative.rosselandMean(Math.pow(10.0, rc + 3.0 * tc - 18.0),
                Math.pow(10.0, tc), composition);
        double offset = edge[0] - Math.log10(ae.kappa());
        double offsetT = tc == lt ? edge[1] - (ae.dlnKappaDlnT() + 3.0 * ae.dlnKappaDlnRho()) : 0.0;
        double offsetR = rc == lr ? edge[2] - ae.dlnKappaDlnRho() : 0.0;
        double widthT = lt < tc ? -coolWidth : edgeWidth;
        double widthR = lr < rc ? -edgeWidth : lr > maxLogR ? denseWidth : edgeWidth;
        double uT = (lt - tc) / widthT;
        double uR = (lr - rc) / widthR;
        double fadeT = fade(uT);
        double fadeR = fade(uR);
        double weight = fadeT * fadeR;
        out[0] += weight * offset;
        out[1] += fadeSlope(uT) / widthT * fadeR * offset + weight * offsetT;
        out[2] += fadeT * fadeSlope(uR) / widthR * offset + weight * offsetR;
    }

    /**
     * The table at (tc, the log R nearest to {@code logR} where its row answers): log kappa and its two slopes into
     * edge[0..2], that log R into edge[3]; returns the table's status there ({@link TabulatedOpacity#ANSWERED} when
     * it answered, NOT_IN_TABLE also when the row answers nowhere).
     */
    private int edgePoint(double tc, double logR, double x, double z, double[] edge) {
        double limit = table.answeredLogRLimit(tc, x, z);
        if (Double.isNaN(limit)) {
            return TabulatedOpacity.NOT_IN_TABLE;
        }
        edge[3] = Math.min(logR, limit);
        return table.interpolate(tc, edge[3], x, z, edge);
    }

    /** Whether (log T, log R) lies beyond every fade, where the analytic terms alone answer. */
    boolean beyondEveryFade(double lt, double lr) {
        return lt < minLogT - coolWidth || lt > maxLogT + edgeWidth || lr < minLogR - edgeWidth
                || lr > maxLogR + denseWidth;
    }

    /**
     * 1 - 3u^2 + 2u^3 on [0, 1], 1 below, 0 above. Value and slope ({@link #fadeSlope}) are two scalars rather than
     * one array: the array of the old single method was allocated at every opacity call in the blend, since its
     * three return paths defeat the JIT's escape analysis.
     */
    static double fade(double u) {
        if (u <= 0.0) {
            return 1.0;
        }
        if (u >= 1.0) {
            return 0.0;
        }
        return 1.0 - u * u * (3.0 - 2.0 * u);
    }

    /** d {@link #fade}/du: -6u(1 - u) on [0, 1], 0 outside. */
    static double fadeSlope(double u) {
        return u <= 0.0 || u >= 1.0 ? 0.0 : -6.0 * u * (1.0 - u);
    }
}
