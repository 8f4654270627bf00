package org.convgrid.engine.physics.opacity;

import java.io.IOException;
import java.io.InputStream;
import java.util.Objects;
import org.convgrid.engine.error.ConvgridException;
import org.convgrid.engine.error.ErrorKind;
import org.convgrid.engine.state.Composition;

/**
 * The OPAL-based Rosseland-mean opacity, in two variants that share one scheme: published tables where they answer,
 * the analytic radiative terms beyond them, and electron conduction in parallel everywhere:
 * <pre>
 *   1/kappa = 1/kappa_rad + 1/kappa_cond      (Kippenhahn, Weigert &amp; Weiss 2012, opacity chapter)
 * </pre>
 * <ul>
 *   <li>{@link #shipped()}, the default: the OPAL GN93 tables (Iglesias &amp; Rogers 1996, ApJ 464, 943; the
 *       "GN93hz" set, log T 3.75-8.70, shipped converted in {@value #RESOURCE}) joined to the low-temperature tables
 *       of Ferguson et al. 2005 (ApJ 623, 585; the GN93 set "f05.g93", the same metal mixture as OPAL's), rows
 *       log T 3.30-4.50 of seven compositions, shipped converted in {@value #COOL_RESOURCE} (X = 0.70 at Z = 1e-4,
 *       0.001, 0.01, 0.02, 0.04; X = 0.35 and 0.80 at Z = 0.02). They alone answer up to log T
 *       {@value #BLEND_FROM_LOG_T}, OPAL alone from {@value #BLEND_TO_LOG_T}; between them log kappa_rad =
 *       w F + (1 - w) O with w = 1 - 3u^2 + 2u^3, u = (log T - {@value #BLEND_FROM_LOG_T}) / ({@value #BLEND_TO_LOG_T}
 *       - {@value #BLEND_FROM_LOG_T}), so value and slope are continuous (our choice of overlap, 0.2 dex wide; the
 *       two sets differ there by 0.05-0.09 dex at log T 4.00 and 0.11-0.18 dex at 3.80, measured per composition by
 *       {@code FergusonTablesTest}). The analytic terms, with the cool set's offset faded over
 *       {@value #COOL_JOIN_WIDTH} dex, answer below log T 3.30 (alone below 3.25; there they lie up to ~4 dex under
 *       the tables at low log R).</li>
 *   <li>{@link #withoutCoolTables()}, the default until the cool tables joined it: the OPAL tables alone and, below
 *       them, the analytic terms with the table offset faded over {@value #COOL_JOIN_WIDTH} dex, so that the
 *       analytic terms alone answer below log T 3.70 (0.3-0.5 dex under the cool tables at log T 3.60-3.70; the
 *       offset removed at log T 3.75 is 0.8-5.8 dex over the 126 compositions, 1.44 dex at X = 0.70, Z = 0.02).
 *       It is the {@link #relaxationAid()} of the default: the relaxation of a pre-main-sequence start guess (an
 *       n = 1.5 polytrope, whose outer layers lie at log R 1.0-1.4, beyond both tables' edge at log R = +1, against
 *       ~-0.5 once relaxed) stalls with the default at 0.5-2 Msun (Z = 0.02; the correction to ln rho at the
 *       second-outermost point grows to ~1e6) but converges with this variant, from whose result the default then
 *       relaxes in a few iterations.</li>
 * </ul>
 * Each table set is interpolated by {@link TabulatedOpacity} (cubic Hermite in log T, log R, X/(1-Z) and
 * log10(Z + 1e-4)); a composition beyond a set's compositions is moved to its nearest one for that set (the cool set
 * spans Z 1e-4 to 0.04 and, at Z = 0.02 only, X 0.35 to 0.80; at its other Z it holds X = 0.70 alone and is taken as
 * constant in X there). Where a set does not answer, the analytic radiative composite
 * ({@link AnalyticCompositeOpacity#standardRadiative()}: H^-, molecules, Kramers terms, scattering) plus the set's
 * table-minus-analytic offset at its nearest answering point, faded out ({@link AnalyticallyEdgedTable}): below the
 * set's coolest row over {@value #COOL_JOIN_WIDTH} dex; beyond log R = -8 or +1 (or the blank hot, dense corner of
 * the OPAL tables) and above log T 8.70 over {@value #EDGE_JOIN_WIDTH} dex; except above the cool set's log R = +1,
 * where the offset is held, not faded (dense cool gas: M-dwarf photospheres, and the outer layers of the
 * pre-main-sequence start guess). There the analytic terms lie under the tables by ~0.4 dex at Z = 0.02 and ~0.9 dex
 * at Z = 1e-4 (estimated from the slopes that follow), and fading that offset over 0.5 dex made kappa fall with
 * density (dln kappa/dln rho down to -0.8 at Z = 0.02 and -2.1 at Z = 1e-4), so
 * that the atmosphere's outer pressure had two roots and its Newton iteration cycled between them, and the
 * relaxation of the start guess stalled; held, the density slope is the analytic terms' (H^-: ~+0.5) and the level
 * the table's at its edge. The joins are continuous in value; their
 * slope changes at the table edge. Conduction (Yakovlev &amp; Urpin 1980, {@link ElectronConduction}) is added in
 * parallel inside the tables too, since both sets are radiative only.
 *
 * <p>The shipped tables are read once, at first use of {@link #shipped()} or {@link #withoutCoolTables()}, and shared
 * by every thread. Immutable and thread-safe.
 */
public final class OpalGn93Opacity implements Opacity {

    /** Classpath resource of the converted OPAL GN93hz tables. */
    public static final String RESOURCE = "/reference/opacity/opal-gn93hz.txt";
    /** Classpath resource of the converted Ferguson et al. 2005 GN93 low-temperature tables. */
    public static final String COOL_RESOURCE = "/reference/opacity/ferguson-gn93-cool.txt";
    /** Below this log T the low-temperature tables alone answer (where they do), when present. */
    public static final double BLEND_FROM_LOG_T = 3.80;
    /** Above this log T the OPAL tables alone answer (where they do). */
    public static final double BLEND_TO_LOG_T = 4.00;
    /** Width (dex in log T) over which a table offset fades below a set's coolest row. */
    public static final double COOL_JOIN_WIDTH = 0.05;
    /** Width (dex) over which a table offset fades beyond the other edges. */
    public static final double EDGE_JOIN_WIDTH = 0.5;

    private static final double LN10 = Math.log(10.0);

    private final AnalyticallyEdgedTable hot;
    private final AnalyticallyEdgedTable cool;
    private final Opacity analyticRadiative;
    private final Opacity conduction;
    private final Opacity aid;

    /**
     * @param table radiative log kappa tables (OPAL), answering alone from log T {@value #BLEND_TO_LOG_T} up when
     *              a cool set is given, everywhere otherwise
     * @param coolTable radiative log kappa tables answering up to log T {@value #BLEND_FROM_LOG_T}, blended with
     *                  table up to {@value #BLEND_TO_LOG_T}; null for none
     * @param analyticRadiative answers where the tables do not (radiative only)
     * @param conduction added in parallel
     */
    public OpalGn93Opacity(TabulatedOpacity table, TabulatedOpacity coolTable, Opacity analyticRadiative,
                           Opacity conduction) {
        this(table, table.name(), coolTable, coolTable == null ? null : coolTable.name(), analyticRadiative,
                conduction);
    }

    /**
     * As the public constructor, with the names {@link #source} gives the tables (the shipped files' names).
     */
    private OpalGn93Opacity(TabulatedOpacity table, String tableLabel, TabulatedOpacity coolTable,
                            String coolTableLabel, Opacity analyticRadiative, Opacity conduction) {
        this.hot = new AnalyticallyEdgedTable(table, tableLabel, analyticRadiative, COOL_JOIN_WIDTH,
                EDGE_JOIN_WIDTH, EDGE_JOIN_WIDTH);
        // the cool set's offset is held above log R = +1 (see the class comment)
        this.cool = coolTable == null ? null : new AnalyticallyEdgedTable(coolTable, coolTableLabel,
                analyticRadiative, COOL_JOIN_WIDTH, EDGE_JOIN_WIDTH, Double.POSITIVE_INFINITY);
        this.analyticRadiative = analyticRadiative;
        this.conduction = Objects.requireNonNull(conduction);
        this.aid = coolTable == null ? this
                : new OpalGn93Opacity(table, tableLabel, null, null, analyticRadiative, conduction);
    }

    /** The file name of a classpath resource: what {@link #source} calls a shipped table. */
    private static String fileName(String resource) {
        return resource.substring(resource.lastIndexOf('/') + 1);
    }

    /**
     * The default: the shipped OPAL tables joined to the shipped low-temperature tables of Ferguson et al. 2005, with
     * the standard analytic edges and conduction; read at the first call, then shared.
     */
    public static OpalGn93Opacity shipped() {
        return Shipped.INSTANCE;
    }

    /**
     * The shipped OPAL tables alone with the standard analytic edges (the analytic terms alone below log T 3.70) and
     * conduction; read at the first call, then shared.
     */
    public static OpalGn93Opacity withoutCoolTables() {
        return ShippedWithoutCoolTables.INSTANCE;
    }

    /** With cool tables: the same OPAL tables without them (see the class comment); otherwise this opacity. */
    @Override
    public Opacity relaxationAid() {
        return aid;
    }

    /** The OPAL radiative tables this opacity interpolates. */
    public TabulatedOpacity table() {
        return hot.table();
    }

    /** The low-temperature radiative tables this opacity interpolates, or null for none. */
    public TabulatedOpacity coolTable() {
        return cool == null ? null : cool.table();
    }

    /**
     * Reads the shipped OPAL tables ({@value #RESOURCE}).
     *
     * @throws ConvgridException BAD_DATA when the resource is missing or unreadable (a broken build)
     */
    public static TabulatedOpacity readShippedTable() {
        return readResource(RESOURCE);
    }

    /**
     * Reads the shipped low-temperature tables ({@value #COOL_RESOURCE}).
     *
     * @throws ConvgridException BAD_DATA when the resource is missing or unreadable (a broken build)
     */
    public static TabulatedOpacity readShippedCoolTable() {
        return readResource(COOL_RESOURCE);
    }

    private static TabulatedOpacity readResource(String resource) {
        try (InputStream in = OpalGn93Opacity.class.getResourceAsStream(resource)) {
            if (in == null) {
                throw new ConvgridException(ErrorKind.BAD_DATA, "missing opacity table " + resource, resource);
            }
            return OpacityTableReader.read(in, resource);
        } catch (IOException e) {
            throw new ConvgridException(ErrorKind.BAD_DATA, "cannot read opacity table " + resource + ": "
                    + e.getMessage(), resource);
        }
    }

    @Override
    public OpacityValue rosselandMean(double density, double temperature, Composition composition) {
        return evaluate(density, temperature, composition, null,
                conduction.rosselandMean(density, temperature, composition));
    }

    /**
     * The tables' weights of the composition taken once per table set (at the first call that needs that set) and
     * the conduction's charge moments once: the same values as {@link #rosselandMean}.
     */
    @Override
    public OpacityAtComposition atComposition(Composition composition) {
        return new AtComposition(composition);
    }

    /**
     * kappa at (density, temperature) with the tables' weights of {@code at} (null: taken from the composition at
     * this call) and the conduction's value {@code cond} there.
     */
    private OpacityValue evaluate(double density, double temperature, Composition composition, AtComposition at,
                                  OpacityValue cond) {
        double lt = Math.log10(temperature);
        double logRho = Math.log10(density);
        double lr = logRho - 3.0 * (lt - 6.0);
        AnalyticallyEdgedTable alone = cool == null ? hot : lt <= BLEND_FROM_LOG_T ? cool : null;
        double rad;
        double radRho;
        double radT;
        if (alone != null && alone.beyondEveryFade(lt, lr)) {
            // the analytic terms alone answer here (no table lookup, no log10 -> exp round trip), with ln rho and
            // ln T from the log10 already taken: the cool photospheres of K and M dwarfs land here
            OpacityValue a = LogArgumentsOpacity.evaluate(analyticRadiative, density, temperature, LN10 * logRho,
                    LN10 * lt, composition);
            rad = a.kappa();
            radRho = a.dlnKappaDlnRho();
            radT = a.dlnKappaDlnT();
        } else {
            double[] out = new double[3];
            if (cool == null) {
                logKappa(hot, density, temperature, composition, at, lt, lr, out);
            } else {
                blend(density, temperature, composition, at, lt, lr, out);
            }
            // out: log10 kappa_rad, d/dlog T at fixed R, d/dlog R at fixed T; log R = log rho - 3 log T + 18
            rad = Math.exp(LN10 * out[0]);
            radRho = out[2];
            radT = out[1] - 3.0 * out[2];
        }
        double c = cond.kappa();
        double wc = rad / (rad + c);
        return new OpacityValue(rad * c / (rad + c), wc * cond.dlnKappaDlnRho() + (1.0 - wc) * radRho,
                wc * cond.dlnKappaDlnT() + (1.0 - wc) * radT);
    }

    /** The radiative part where a cool set is present: either set alone, or both blended over the overlap. */
    private void blend(double density, double temperature, Composition composition, AtComposition at, double lt,
                       double lr, double[] out) {
        double width = BLEND_TO_LOG_T - BLEND_FROM_LOG_T;
        double u = (lt - BLEND_FROM_LOG_T) / width;
        double w = AnalyticallyEdgedTable.fade(u);
        if (w == 1.0) {
            logKappa(cool, density, temperature, composition, at, lt, lr, out);
        } else if (w == 0.0) {
            logKappa(hot, density, temperature, composition, at, lt, lr, out);
        } else {
            double[] h = new double[3];
            logKappa(hot, density, temperature, composition, at, lt, lr, h);
            logKappa(cool, density, temperature, composition, at, lt, lr, out);
            double diff = out[0] - h[0];
            out[1] = h[1] + w * (out[1] - h[1]) + AnalyticallyEdgedTable.fadeSlope(u) / width * diff;
            out[2] = h[2] + w * (out[2] - h[2]);
            out[0] = h[0] + w * diff;
        }
    }

    /** One table set's log kappa, with the weights {@code at} holds for it (null: taken at this call). */
    private static void logKappa(AnalyticallyEdgedTable set, double density, double temperature,
                                 Composition composition, AtComposition at, double lt, double lr, double[] out) {
        if (at == null) {
            set.logKappa(density, temperature, composition, lt, lr, out);
        } else {
            set.logKappa(density, temperature, composition, at.weightsIn(set), lt, lr, out);
        }
    }

    /**
     * This opacity at one composition. The tables' weights of each set are taken at the first call that needs that
     * set (a point of the core never needs the cool set); the fields hold them once taken, written without a lock:
     * each is an object with final fields, so a thread sees either none (and takes the same weights itself) or a
     * complete one.
     */
    private final class AtComposition implements OpacityAtComposition {

        private final Composition composition;
        private final OpacityAtComposition conductionAt;
        private TableAtComposition hotAt;
        private TableAtComposition coolAt;

        AtComposition(Composition composition) {
            this.composition = Objects.requireNonNull(composition);
            this.conductionAt = conduction.atComposition(composition);
        }

        @Override
        public OpacityValue rosselandMean(double density, double temperature) {
            return evaluate(density, temperature, composition, this, conductionAt.rosselandMean(density, temperature));
        }

        /** The weights of this composition in {@code set} (the hot or the cool one), taken at the first call. */
        TableAtComposition weightsIn(AnalyticallyEdgedTable set) {
            boolean isHot = set == hot;
            TableAtComposition at = isHot ? hotAt : coolAt;
            if (at == null) {
                at = set.atComposition(composition);
                if (isHot) {
                    hotAt = at;
                } else {
                    coolAt = at;
                }
            }
            return at;
        }
    }

    /**
     * What answers at this point, in words for a reader (probe): the table file and the Z of the tables
     * interpolated, for the low-temperature set alone (up to log T {@value #BLEND_FROM_LOG_T}), OPAL alone (from
     * {@value #BLEND_TO_LOG_T}) or both, with the low-temperature set's weight, between; the analytic terms where
     * they answer (see {@link AnalyticallyEdgedTable#source}). Conduction, added in parallel everywhere, is not
     * named.
     */
    public String source(double density, double temperature, Composition composition) {
        double lt = Math.log10(temperature);
        double lr = Math.log10(density) - 3.0 * (lt - 6.0);
        if (cool == null) {
            return hot.source(lt, lr, composition);
        }
        double w = AnalyticallyEdgedTable.fade((lt - BLEND_FROM_LOG_T) / (BLEND_TO_LOG_T - BLEND_FROM_LOG_T));
        if (w == 1.0) {
            return cool.source(lt, lr, composition);
        }
        if (w == 0.0) {
            return hot.source(lt, lr, composition);
        }
        return String.format(java.util.Locale.ROOT, "%s (weight %.2f) blended with %s", cool.source(lt, lr,
                composition), w, hot.source(lt, lr, composition));
    }

    /**
     * Whether the tables themselves answer at (log10 T, log10 R) for this composition (no analytic join): the
     * set, or both sets in the overlap, in use there.
     */
    boolean tableAnswers(double logT, double logR, Composition composition) {
        if (cool == null) {
            return hot.answers(logT, logR, composition);
        }
        boolean coolAnswers = logT >= BLEND_TO_LOG_T || cool.answers(logT, logR, composition);
        boolean hotAnswers = logT <= BLEND_FROM_LOG_T || hot.answers(logT, logR, composition);
        return coolAnswers && hotAnswers;
    }

    /** Holder: the class initialises (and reads the OPAL tables) at the first call of either accessor. */
    private static final class ShippedWithoutCoolTables {
        static final OpalGn93Opacity INSTANCE = new OpalGn93Opacity(readShippedTable(), fileName(RESOURCE), null,
                null, AnalyticCompositeOpacity.standardRadiative(), new ElectronConduction());
    }

    /** Holder: the class initialises (and reads the cool set) at the first call of {@link #shipped()}. */
    private static final class Shipped {
        static final OpalGn93Opacity INSTANCE = new OpalGn93Opacity(ShippedWithoutCoolTables.INSTANCE.table(),
                fileName(RESOURCE), readShippedCoolTable(), fileName(COOL_RESOURCE),
                AnalyticCompositeOpacity.standardRadiative(), new ElectronConduction());
    }
}
