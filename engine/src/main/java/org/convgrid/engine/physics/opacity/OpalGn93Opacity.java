package org.convgrid.engine.physics.opacity;

import java.io.IOException;
import java.io.InputStream;
import java.util.Objects;
import org.convgrid.engine.error.ConvgridException;
import org.convgrid.engine.error.ErrorKind;
import org.convgrid.engine.state.Composition;

/**
 * The default Rosseland-mean opacity: the published OPAL GN93 tables (Iglesias &amp; Rogers 1996, ApJ 464, 943;
 * the "GN93hz" set, shipped converted in {@value #RESOURCE}) wherever they answer, the analytic radiative terms
 * joined to them where they do not, and electron conduction in parallel everywhere:
 * <pre>
 *   1/kappa = 1/kappa_rad + 1/kappa_cond      (Kippenhahn, Weigert &amp; Weiss 2012, opacity chapter)
 * </pre>
 * kappa_rad is the table ({@link TabulatedOpacity}: cubic Hermite in log T, log R, X/(1-Z) and log10(Z + 1e-4)).
 * Where no table answers, kappa_rad is the analytic radiative composite
 * ({@link AnalyticCompositeOpacity#standardRadiative()}: H^-, molecules, Kramers terms, scattering) plus the
 * table-minus-analytic offset (dex) taken at the nearest point where the table answers, faded out with the
 * distance d from it as 1 - 3u^2 + 2u^3, u = d/width:
 * <ul>
 *   <li>below log T = 3.75 (cool gas: H^- and molecules), width {@value #COOL_JOIN_WIDTH} dex, so the analytic
 *       terms alone answer below log T = 3.70;</li>
 *   <li>above the tables' right edge in log R (log R = 1, or lower where the published tables leave the hot,
 *       dense corner blank), below log R = -8 and above the last log T (8.70), width {@value #EDGE_JOIN_WIDTH}
 *       dex. Inside the blank corner the edge is taken per table row in log T, so the join is continuous in log R
 *       but can step across log T rows there (white-dwarf-like densities that main-sequence models do not
 *       reach).</li>
 *   <li>The few blank cells on the low-R side of the coolest rows (X = 0 tables, log T &lt; 4) have no nearest
 *       edge in this scheme: the analytic terms alone answer there, with a jump at the blank's edge (only
 *       hydrogen-free gas below 10^4 K, which no main-sequence model holds).</li>
 * </ul>
 * Measured with the GN93hz tables, the offset the cool join removes at log T = 3.75 (largest over log R, per
 * composition) is 0.8-5.8 dex: 1.44 dex (rms 0.58) at X = 0.70, Z = 0.02, 3.7 dex (rms 2.5) at X = 0.70,
 * Z = 1e-4 ({@code OpalGn93OpacityTest} with {@code -Dconvgrid.measure=true} prints it per composition); below
 * log T = 3.70 the analytic terms are that far from a continuation of the tables.
 * The join is continuous in value; its slope changes at the table edge. A composition outside the tables (Z above
 * their largest Z, or X/(1-Z) beyond a row's range) is moved to the nearest tabulated one for the table part.
 * Conduction (Yakovlev &amp; Urpin 1980, {@link ElectronConduction}) is added in parallel inside the tables too,
 * since the OPAL values are radiative only; it matters in dense, degenerate matter (the cores of the lowest masses,
 * above log R = 1) and is negligible in the rest of a main-sequence star.
 *
 * <p>The shipped table is read once, at first use of {@link #shipped()}, and shared by every thread. Immutable and
 * thread-safe.
 */
public final class OpalGn93Opacity implements Opacity {

    /** Classpath resource of the converted OPAL GN93hz tables. */
    public static final String RESOURCE = "/reference/opacity/opal-gn93hz.txt";
    /** Width (dex in log T) over which the table offset fades below the coolest row. */
    public static final double COOL_JOIN_WIDTH = 0.05;
    /** Width (dex) over which the table offset fades beyond the other edges. */
    public static final double EDGE_JOIN_WIDTH = 0.5;

    private static final double LN10 = Math.log(10.0);

    private final TabulatedOpacity table;
    private final Opacity analyticRadiative;
    private final Opacity conduction;
    private final double minLogT;
    private final double maxLogT;
    private final double minLogR;
    private final double maxLogR;

    /**
     * @param table radiative log kappa tables
     * @param analyticRadiative answers where the table does not (radiative only)
     * @param conduction added in parallel
     */
    public OpalGn93Opacity(TabulatedOpacity table, Opacity analyticRadiative, Opacity conduction) {
        this.table = Objects.requireNonNull(table);
        this.analyticRadiative = Objects.requireNonNull(analyticRadiative);
        this.conduction = Objects.requireNonNull(conduction);
        double[] t = table.logTemperatures();
        double[] r = table.logR();
        minLogT = t[0];
        maxLogT = t[t.length - 1];
        minLogR = r[0];
        maxLogR = r[r.length - 1];
    }

    /** The shipped tables with the standard analytic edges and conduction; read at the first call, then shared. */
    public static OpalGn93Opacity shipped() {
        return Shipped.INSTANCE;
    }

    /** The radiative tables this opacity interpolates. */
    public TabulatedOpacity table() {
        return table;
    }

    /**
     * Reads the shipped tables ({@value #RESOURCE}).
     *
     * @throws ConvgridException BAD_DATA when the resource is missing or unreadable (a broken build)
     */
    public static TabulatedOpacity readShippedTable() {
        try (InputStream in = OpalGn93Opacity.class.getResourceAsStream(RESOURCE)) {
            if (in == null) {
                throw new ConvgridException(ErrorKind.BAD_DATA, "missing opacity table " + RESOURCE, RESOURCE);
            }
            return OpacityTableReader.read(in, RESOURCE);
        } catch (IOException e) {
            throw new ConvgridException(ErrorKind.BAD_DATA, "cannot read opacity table " + RESOURCE + ": "
                    + e.getMessage(), RESOURCE);
        }
    }

    @Override
    public OpacityValue rosselandMean(double density, double temperature, Composition composition) {
        double lt = Math.log10(temperature);
        double lr = Math.log10(density) - 3.0 * (lt - 6.0);
        double[] out = new double[3];
        double x = composition.x();
        double z = composition.z();
        int status = table.interpolate(lt, lr, x, z, out);
        if (status == TabulatedOpacity.OUTSIDE_COMPOSITIONS) {
            z = table.clampMetals(z);
            x = tableHydrogen(composition, z);
            status = table.interpolate(lt, lr, x, z, out);
        }
        double rad;
        double radRho;
        double radT;
        if (status != TabulatedOpacity.ANSWERED && beyondEveryFade(lt, lr)) {
            OpacityValue a = analyticRadiative.rosselandMean(density, temperature, composition);
            rad = a.kappa();
            radRho = a.dlnKappaDlnRho();
            radT = a.dlnKappaDlnT();
        } else {
            if (status != TabulatedOpacity.ANSWERED) {
                joinAnalytic(density, temperature, composition, lt, lr, x, z, out);
            }
            // out: log10 kappa_rad, d/dlog T at fixed R, d/dlog R at fixed T; log R = log rho - 3 log T + 18
            rad = Math.exp(LN10 * out[0]);
            radRho = out[2];
            radT = out[1] - 3.0 * out[2];
        }
        OpacityValue cond = conduction.rosselandMean(density, temperature, composition);
        double c = cond.kappa();
        double wc = rad / (rad + c);
        return new OpacityValue(rad * c / (rad + c), wc * cond.dlnKappaDlnRho() + (1.0 - wc) * radRho,
                wc * cond.dlnKappaDlnT() + (1.0 - wc) * radT);
    }

    /** X for the table part at table metals z: the request's hydrogen share X/(1-Z), moved into the tables. */
    private double tableHydrogen(Composition composition, double z) {
        double x = composition.x();
        if (z != composition.z()) {
            x *= (1.0 - z) / (1.0 - composition.z());
        }
        return table.clampHydrogen(x, z);
    }

    /** Whether the tables themselves answer at (log10 T, log10 R) for this composition (no analytic join). */
    boolean tableAnswers(double logT, double logR, Composition composition) {
        double z = table.clampMetals(composition.z());
        return table.interpolate(logT, logR, tableHydrogen(composition, z), z, new double[3])
                == TabulatedOpacity.ANSWERED;
    }

    /** The analytic radiative opacity plus the faded offset to the nearest answering table point, into out. */
    private void joinAnalytic(double density, double temperature, Composition composition, double lt, double lr,
                              double x, double z, double[] out) {
        OpacityValue a = analyticRadiative.rosselandMean(density, temperature, composition);
        out[0] = Math.log10(a.kappa());
        out[2] = a.dlnKappaDlnRho();
        out[1] = a.dlnKappaDlnT() + 3.0 * out[2];
        double tc = Math.min(Math.max(lt, minLogT), maxLogT);
        double rc = Math.min(Math.max(lr, minLogR), maxLogR);
        double limit = table.answeredLogRLimit(tc, x, z);
        if (Double.isNaN(limit)) {
            return;
        }
        rc = Math.min(rc, limit);
        double[] edge = new double[3];
        if (table.interpolate(tc, rc, x, z, edge) != TabulatedOpacity.ANSWERED) {
            return;
        }
        OpacityValue ae = analyticRadiative.rosselandMean(Math.pow(10.0, rc + 3.0 * tc - 18.0),
                Math.pow(10.0, tc), composition);
        double offset = edge[0] - Math.log10(ae.kappa());
        double offsetT = tc == lt ? edge[1] - (ae.dlnKappaDlnT() + 3.0 * ae.dlnKappaDlnRho()) : 0.0;
        double offsetR = rc == lr ? edge[2] - ae.dlnKappaDlnRho() : 0.0;
        double widthT = lt < tc ? -COOL_JOIN_WIDTH : EDGE_JOIN_WIDTH;
        double widthR = lr < rc ? -EDGE_JOIN_WIDTH : EDGE_JOIN_WIDTH;
        double[] fadeT = fade((lt - tc) / widthT);
        double[] fadeR = fade((lr - rc) / widthR);
        double weight = fadeT[0] * fadeR[0];
        out[0] += weight * offset;
        out[1] += fadeT[1] / widthT * fadeR[0] * offset + weight * offsetT;
        out[2] += fadeT[0] * fadeR[1] / widthR * offset + weight * offsetR;
    }

    /** Whether (log T, log R) lies beyond every fade, where the analytic terms alone answer. */
    private boolean beyondEveryFade(double lt, double lr) {
        return lt < minLogT - COOL_JOIN_WIDTH || lt > maxLogT + EDGE_JOIN_WIDTH || lr < minLogR - EDGE_JOIN_WIDTH
                || lr > maxLogR + EDGE_JOIN_WIDTH;
    }

    /** 1 - 3u^2 + 2u^3 on [0, 1], 1 below, 0 above; returns {value, d/du}. */
    static double[] fade(double u) {
        if (u <= 0.0) {
            return new double[] {1.0, 0.0};
        }
        if (u >= 1.0) {
            return new double[] {0.0, 0.0};
        }
        return new double[] {1.0 - u * u * (3.0 - 2.0 * u), -6.0 * u * (1.0 - u)};
    }

    /** Holder: the class initialises (and reads the table) at the first call of {@link #shipped()}. */
    private static final class Shipped {
        static final OpalGn93Opacity INSTANCE = new OpalGn93Opacity(readShippedTable(),
                AnalyticCompositeOpacity.standardRadiative(), new ElectronConduction());
    }
}
