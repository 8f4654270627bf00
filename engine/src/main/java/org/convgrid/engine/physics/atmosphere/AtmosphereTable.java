package org.convgrid.engine.physics.atmosphere;

import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.atomic.AtomicReferenceArray;

import org.convgrid.engine.error.ConvgridException;
import org.convgrid.engine.error.ErrorKind;
import org.convgrid.engine.state.Composition;

/**
 * A {@link SurfaceBoundary} tabulated per composition on a (log Teff, log g) grid and interpolated by
 * bicubic Hermite patches (e.g. Press et al. 2007, Numerical Recipes 3rd ed., sec. 3.6), so that ln P, ln T
 * and their first derivatives are continuous and the derivatives reported are those of the interpolant
 * (what a Newton solver needs). Node values and first derivatives come from the wrapped boundary; the cross
 * derivative is the centred difference of d/d ln g along ln Teff (see {@link HermitePatch}).
 *
 * <p>Default grid: log Teff 3.30-4.80 (about 2000-63000 K) in {@value #DEFAULT_TEFF_POINTS} nodes, log g
 * 2.5-6.0 in {@value #DEFAULT_GRAVITY_POINTS} nodes (steps 0.033 and 0.35 dex): with an H^-, Kramers and
 * electron-scattering opacity this reproduces the direct integration to about 3e-4 in ln P between nodes; with the
 * standard physics (tabulated opacities, whose low-temperature part bends fastest) to 1e-3-3e-3 at log Teff
 * 3.45-3.8, ~6e-3 above and 0.03-0.06 below log Teff 3.45 (measured at mid-cell points of this grid and of the
 * low-gravity one, 2026-12-03), except in the coolest low-gravity cells just above log Teff 3.45: 1.2e-2 at log Teff
 * 3.481, log g 3.75 (Z = 0.02, at 0.43 and 0.57 of the cell's steps; the same 1.19e-2 from tables integrated at
 * tolerances 1e-7, 1e-9 and 1e-10, so it is the interpolation, not the nodes; AtmosphereNodeProbe, 2026-12-04,
 * table mean 4.7e-4; young 0.1-1 Msun stars at Z = 0.02 come out within 1.1e-4 in R and 3.5e-4 in Teff of the same
 * tracks with the atmosphere integrated at every surface, AtmosphereTableEffectProbe); in those coolest atmospheres the grey approximation itself is the larger error
 * (Chabrier &amp; Baraffe 1997, A&amp;A 327, 1039; from memory). A node of
 * {@link GreyAtmosphere} with the standard physics costs 412-419 EOS and opacity calls on average over the nodes the
 * 200-model zero-age grid visits (1022-1047 at the former step-size tolerance 1e-9; AtmosphereNodeProbe), about
 * 0.6 ms of one core (1.0-1.1 ms while each call inverted the EOS for the density). Nodes where the wrapped boundary fails (for instance
 * hot, low-gravity atmospheres above the Eddington limit) are marked missing; queries outside the grid or in a cell
 * with a missing corner fail with {@link ErrorKind#OFF_TABLE}, parameters ("atmosphere", Teff, g).
 *
 * <p>Nodes are integrated on first use, not all at once: a cell needs its four corners and their neighbours
 * along Teff (for the cross derivatives), at most 8 nodes, and a zero-age model's surface visits a few
 * cells, so it pays for a few dozen of the {@value #DEFAULT_TEFF_POINTS} x {@value #DEFAULT_GRAVITY_POINTS} nodes.
 *
 * <p>Thread-safe: each node, once integrated, is kept and never changes; per-composition tables are kept in a
 * small concurrent cache (at most {@value #CACHE_SIZE} compositions, emptied when full). A node is a pure
 * function of (Teff, g, composition), so no answer depends on which thread integrated which node, or when.
 */
public final class AtmosphereTable implements SurfaceBoundary {

    public static final int DEFAULT_TEFF_POINTS = 46;
    public static final int DEFAULT_GRAVITY_POINTS = 11;
    /** Default log10 Teff axis, K. */
    public static final TableAxis DEFAULT_TEFF_AXIS = new TableAxis(3.30, 4.80, DEFAULT_TEFF_POINTS);
    /** Default log10 g axis, cm s^-2. */
    public static final TableAxis DEFAULT_GRAVITY_AXIS = new TableAxis(2.5, 6.0, DEFAULT_GRAVITY_POINTS);
    /**
     * log10 Teff axis of the low-gravity table, K: the default axis's nodes up to 10 000 K, where the surfaces of
     * young stars high on their Hayashi tracks lie (start models 2650-5100 K, measured 0.1-10 Msun every 0.1 dex,
     * Z 1e-4-0.04).
     */
    public static final TableAxis LOW_GRAVITY_TEFF_AXIS = new TableAxis(3.30, 4.00, 22);
    /**
     * log10 g axis of the low-gravity table, cm s^-2: the default axis's spacing continued below its lowest node,
     * down to log g 0.75 (start models of 1-10 Msun have log g 1.5-2.0), so that its top row is the default
     * table's bottom row.
     */
    public static final TableAxis LOW_GRAVITY_AXIS = new TableAxis(0.75, 2.5, 6);
    /** Most compositions kept at once. */
    public static final int CACHE_SIZE = 8;

    private final SurfaceBoundary source;
    private final TableAxis teffAxis;
    private final TableAxis gravityAxis;
    private final Map<Composition, Grid> cache = new ConcurrentHashMap<>();

    /** The source tabulated on the default grid. */
    public AtmosphereTable(SurfaceBoundary source) {
        this(source, DEFAULT_TEFF_AXIS, DEFAULT_GRAVITY_AXIS);
    }

    /**
     * @param teffAxis log10 Teff nodes (Teff in K)
     * @param gravityAxis log10 g nodes (g in cm s^-2)
     */
    public AtmosphereTable(SurfaceBoundary source, TableAxis teffAxis, TableAxis gravityAxis) {
        this.source = source;
        this.teffAxis = teffAxis;
        this.gravityAxis = gravityAxis;
    }

    @Override
    public SurfaceCondition at(double effectiveTemperature, double gravity, Composition composition) {
        if (cache.size() >= CACHE_SIZE && !cache.containsKey(composition)) {
            cache.clear();
        }
        Grid grid = cache.computeIfAbsent(composition,
                c -> new Grid(source, c, teffAxis, gravityAxis));
        return grid.at(effectiveTemperature, gravity);
    }

    /**
     * The table of one composition, for callers that keep it. Its nodes are integrated when a query first needs
     * them (the four corners of the query's cell and their neighbours along Teff), so a model pays for the few cells its
     * surface visits rather than for the whole grid; the answers are those of a table built in full.
     */
    public SurfaceBoundary tabulate(Composition composition) {
        Grid grid = new Grid(source, composition, teffAxis, gravityAxis);
        return (teff, g, c) -> grid.at(teff, g);
    }

    /**
     * The nodes of one composition: ln P and ln T with their derivatives along ln Teff (x) and ln g (y). A node is
     * integrated the first time a cell that needs it is evaluated and kept; two threads that need the same new node
     * may both integrate it, which wastes a little time but changes nothing, since a node is a pure function of
     * (Teff, g, composition).
     */
    private static final class Grid {
        private static final double LN10 = Math.log(10.0);
        private static final SurfaceCondition MISSING = new SurfaceCondition(Double.NaN, Double.NaN, Double.NaN,
                Double.NaN, Double.NaN, Double.NaN);
        private final SurfaceBoundary source;
        private final Composition composition;
        private final TableAxis teffAxis;
        private final TableAxis gravityAxis;
        private final double x0;
        private final double y0;
        private final double hx;
        private final double hy;
        private final int nx;
        private final int ny;
        private final HermitePatch patch;
        private final AtomicReferenceArray<SurfaceCondition> nodes;

        Grid(SurfaceBoundary source, Composition composition, TableAxis teffAxis, TableAxis gravityAxis) {
            this.source = source;
            this.composition = composition;
            this.teffAxis = teffAxis;
            this.gravityAxis = gravityAxis;
            nx = teffAxis.points();
            ny = gravityAxis.points();
            x0 = teffAxis.min() * LN10;
            y0 = gravityAxis.min() * LN10;
            hx = teffAxis.step() * LN10;
            hy = gravityAxis.step() * LN10;
            patch = new HermitePatch(nx, ny, hx, hy);
            nodes = new AtomicReferenceArray<>(nx * ny);
        }

        /** Node (i, j), integrated on first use. */
        private SurfaceCondition node(int i, int j) {
            SurfaceCondition s = nodes.get(i * ny + j);
            if (s == null) {
                s = integrate(Math.pow(10.0, teffAxis.node(i)), Math.pow(10.0, gravityAxis.node(j)));
                nodes.set(i * ny + j, s);
            }
            return s;
        }

        private SurfaceCondition integrate(double teff, double g) {
            try {
                return source.at(teff, g, composition);
            } catch (ConvgridException e) {
                return MISSING; // no atmosphere here (e.g. super-Eddington)
            }
        }

        private double pressure(int i, int j, int component) {
            SurfaceCondition s = node(i, j);
            return switch (component) {
                case HermitePatch.VALUE -> s.lnPressure();
                case HermitePatch.D_DX -> s.dlnPDlnTeff();
                default -> s.dlnPDlnG();
            };
        }

        private double temperature(int i, int j, int component) {
            SurfaceCondition s = node(i, j);
            return switch (component) {
                case HermitePatch.VALUE -> s.lnTemperature();
                case HermitePatch.D_DX -> s.dlnTDlnTeff();
                default -> s.dlnTDlnG();
            };
        }

        SurfaceCondition at(double teff, double g) {
            double x = (Math.log(teff) - x0) / hx;
            double y = (Math.log(g) - y0) / hy;
            if (!(x >= 0.0 && x <= nx - 1 && y >= 0.0 && y <= ny - 1)) {
                throw offTable(teff, g);
            }
            int i = Math.min((int) x, nx - 2);
            int j = Math.min((int) y, ny - 2);
            double[] vp = patch.evaluate(this::pressure, i, j, x - i, y - j);
            double[] vt = patch.evaluate(this::temperature, i, j, x - i, y - j);
            if (Double.isNaN(vp[0]) || Double.isNaN(vt[0])) {
                throw offTable(teff, g);
            }
            return new SurfaceCondition(vp[0], vt[0], vp[1], vp[2], vt[1], vt[2]);
        }

        private static ConvgridException offTable(double teff, double g) {
            return new ConvgridException(ErrorKind.OFF_TABLE, String.format(
                    "Teff = %s K, g = %s cm s^-2 is outside the atmosphere table or in a cell without an atmosphere",
                    teff, g), "atmosphere", teff, g);
        }
    }
}
