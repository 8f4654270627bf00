package org.convgrid.engine.physics.atmosphere;

import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;

import org.convgrid.engine.error.ConvgridException;
import org.convgrid.engine.error.ErrorKind;
import org.convgrid.engine.state.Composition;

/**
 * A {@link SurfaceBoundary} tabulated once per composition on a (log Teff, log g) grid and interpolated by
 * bicubic Hermite patches (e.g. Press et al. 2007, Numerical Recipes 3rd ed., sec. 3.6), so that ln P, ln T
 * and their first derivatives are continuous and the derivatives reported are those of the interpolant
 * (what a Newton solver needs). Node values and first derivatives come from the wrapped boundary; the cross
 * derivative is the average of the two centred differences of the first derivatives.
 *
 * <p>Default grid: log Teff 3.30-4.80 (about 2000-63000 K) in {@value #DEFAULT_TEFF_POINTS} nodes, log g
 * 2.5-6.0 in {@value #DEFAULT_GRAVITY_POINTS} nodes (steps 0.033 and 0.35 dex): with an H^-, Kramers and
 * electron-scattering opacity this reproduces the direct integration to about 3e-4 in ln P between nodes, at
 * about 230 EOS and opacity calls per node for {@link GreyAtmosphere}. Nodes where the wrapped boundary fails (for instance
 * hot, low-gravity atmospheres above the Eddington limit) are marked missing; queries outside the grid or in a
 * cell with a missing corner fail with {@link ErrorKind#OFF_TABLE}, parameters ("atmosphere", Teff, g).
 *
 * <p>Thread-safe: the per-composition tables are immutable and kept in a small concurrent cache (at most
 * {@value #CACHE_SIZE} compositions, emptied when full); a table's values do not depend on when or by which
 * thread it was built. Building is single-threaded.
 */
public final class AtmosphereTable implements SurfaceBoundary {

    public static final int DEFAULT_TEFF_POINTS = 46;
    public static final int DEFAULT_GRAVITY_POINTS = 11;
    /** Default log10 Teff axis, K. */
    public static final TableAxis DEFAULT_TEFF_AXIS = new TableAxis(3.30, 4.80, DEFAULT_TEFF_POINTS);
    /** Default log10 g axis, cm s^-2. */
    public static final TableAxis DEFAULT_GRAVITY_AXIS = new TableAxis(2.5, 6.0, DEFAULT_GRAVITY_POINTS);
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

    /** Builds the table for one composition now (single-threaded) and returns it, for callers that keep it. */
    public SurfaceBoundary tabulate(Composition composition) {
        Grid grid = new Grid(source, composition, teffAxis, gravityAxis);
        return (teff, g, c) -> grid.at(teff, g);
    }

    /** The nodes of one composition: ln P and ln T with their derivatives along ln Teff (x) and ln g (y). */
    private static final class Grid {
        private static final double LN10 = Math.log(10.0);
        private final double x0;
        private final double y0;
        private final double hx;
        private final double hy;
        private final int nx;
        private final int ny;
        private final HermitePatch lnP;
        private final HermitePatch lnT;

        Grid(SurfaceBoundary source, Composition composition, TableAxis teffAxis, TableAxis gravityAxis) {
            nx = teffAxis.points();
            ny = gravityAxis.points();
            x0 = teffAxis.min() * LN10;
            y0 = gravityAxis.min() * LN10;
            hx = teffAxis.step() * LN10;
            hy = gravityAxis.step() * LN10;
            double[][][] p = new double[3][nx][ny];
            double[][][] t = new double[3][nx][ny];
            for (int i = 0; i < nx; i++) {
                for (int j = 0; j < ny; j++) {
                    SurfaceCondition s = node(source, Math.pow(10.0, teffAxis.node(i)),
                            Math.pow(10.0, gravityAxis.node(j)), composition);
                    p[0][i][j] = s.lnPressure();
                    p[1][i][j] = s.dlnPDlnTeff();
                    p[2][i][j] = s.dlnPDlnG();
                    t[0][i][j] = s.lnTemperature();
                    t[1][i][j] = s.dlnTDlnTeff();
                    t[2][i][j] = s.dlnTDlnG();
                }
            }
            lnP = new HermitePatch(p[0], p[1], p[2], hx, hy);
            lnT = new HermitePatch(t[0], t[1], t[2], hx, hy);
        }

        private static SurfaceCondition node(SurfaceBoundary source, double teff, double g, Composition c) {
            try {
                return source.at(teff, g, c);
            } catch (ConvgridException e) {
                double nan = Double.NaN; // missing node: no atmosphere here (e.g. super-Eddington)
                return new SurfaceCondition(nan, nan, nan, nan, nan, nan);
            }
        }

        SurfaceCondition at(double teff, double g) {
            double x = (Math.log(teff) - x0) / hx;
            double y = (Math.log(g) - y0) / hy;
            if (!(x >= 0.0 && x <= nx - 1 && y >= 0.0 && y <= ny - 1)) {
                throw offTable(teff, g);
            }
            int i = Math.min((int) x, nx - 2);
            int j = Math.min((int) y, ny - 2);
            double[] vp = lnP.evaluate(i, j, x - i, y - j);
            double[] vt = lnT.evaluate(i, j, x - i, y - j);
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
