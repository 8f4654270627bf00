package org.convgrid.engine.evolution;

import org.apache.commons.math3.analysis.interpolation.LinearInterpolator;
import org.apache.commons.math3.analysis.polynomials.PolynomialSplineFunction;
import org.convgrid.engine.structure.MassMesh;
import org.convgrid.engine.structure.ModelState;

/**
 * The unknowns of a model (ln r, ln rho, ln T, L per point) carried onto another mesh, linearly in the mesh
 * coordinate ln(m/(M - m)), for the time extrapolation of a step's starting guess after a remesh. Only the
 * differences between models carried the same way enter the guess, so the interpolation error of each model
 * largely cancels; the centre and the surface point map onto the centre and the surface point.
 */
final class CarriedUnknowns {

    private CarriedUnknowns() {
    }

    /** ln r, ln rho, ln T and L of {@code state} at the points of {@code target}, in that order. */
    static double[][] onto(ModelState state, MassMesh target) {
        return onto(state, target, true);
    }

    /**
     * As {@link #onto(ModelState, MassMesh)}; without {@code fillOuterInterval} the points of {@code target} beyond
     * the last interior point of {@code state} hold that point's values, as main-sequence steps have them (filling
     * the interval there changes no step but moves the converged models within the solver's tolerance, e.g. L of the
     * 3 Msun zero-age track at exhaustion by 2e-10, measured; main-sequence results stay bit for bit as they were).
     */
    static double[][] onto(ModelState state, MassMesh target, boolean fillOuterInterval) {
        BothWays carried = bothWays(state, target);
        return fillOuterInterval ? carried.filled() : carried.clamped();
    }

    /**
     * The unknowns carried both ways at once, {@link #onto(ModelState, MassMesh, boolean)} without and with the
     * outermost interval filled, for a pre-main-sequence step that needs the one for its network's rho and T and
     * the other for its starting guess: each line is built and evaluated once, and the two differ only at the points
     * beyond the last interior point of {@code state}. On the same mesh both are the state's own arrays.
     */
    static BothWays bothWays(ModelState state, MassMesh target) {
        double[][] values = {state.lnRadii(), state.lnDensities(), state.lnTemperatures(), state.luminosities()};
        MassMesh mesh = state.mesh();
        if (mesh == target) {
            return new BothWays(values, values);
        }
        int n = mesh.size();
        double[] x = interiorLogits(mesh);
        int m = target.size();
        double[][] clamped = new double[values.length][m];
        double[][] filled = new double[values.length][m];
        for (int v = 0; v < values.length; v++) {
            PolynomialSplineFunction line = interiorLine(mesh, x, values[v]);
            clamped[v][0] = values[v][0];
            clamped[v][m - 1] = values[v][n - 1];
            filled[v][0] = values[v][0];
            filled[v][m - 1] = values[v][n - 1];
            for (int k = 1; k < m - 1; k++) {
                double inside = line.value(Math.min(Math.max(target.logit(k), x[0]), x[x.length - 1]));
                clamped[v][k] = inside;
                if (target.logit(k) > x[x.length - 1]) {
                    double w = outerWeight(state, target.exteriorFraction(k));
                    filled[v][k] = (1.0 - w) * values[v][n - 2] + w * values[v][n - 1];
                } else {
                    filled[v][k] = inside;
                }
            }
        }
        return new BothWays(clamped, filled);
    }

    /**
     * @param clamped as {@link #onto(ModelState, MassMesh, boolean)} without the outermost interval filled
     * @param filled as it with the interval filled
     */
    record BothWays(double[][] clamped, double[][] filled) {
    }

    /**
     * One value per point of {@code mesh} carried onto the points of {@code target} the same way as the unknowns
     * (linearly in ln(m/(M - m)), centre onto centre, surface onto surface).
     */
    static double[] valuesOnto(MassMesh mesh, double[] values, MassMesh target) {
        if (mesh == target) {
            return values.clone();
        }
        int n = mesh.size();
        double[] x = interiorLogits(mesh);
        PolynomialSplineFunction line = interiorLine(mesh, x, values);
        int m = target.size();
        double[] carried = new double[m];
        carried[0] = values[0];
        carried[m - 1] = values[n - 1];
        for (int k = 1; k < m - 1; k++) {
            carried[k] = line.value(Math.min(Math.max(target.logit(k), x[0]), x[x.length - 1]));
        }
        return carried;
    }

    /** The index of the first point with a finite mesh coordinate (the centre, m = 0, has none). */
    private static int firstInterior(MassMesh mesh) {
        return Double.isFinite(mesh.logit(0)) ? 0 : 1;
    }

    /** ln(m/(M - m)) of the points from the first finite one to the last interior point. */
    private static double[] interiorLogits(MassMesh mesh) {
        int first = firstInterior(mesh);
        double[] x = new double[mesh.size() - 1 - first];
        for (int k = 0; k < x.length; k++) {
            x[k] = mesh.logit(first + k);
        }
        return x;
    }

    /** {@code values} at those points, joined linearly in the mesh coordinate. */
    private static PolynomialSplineFunction interiorLine(MassMesh mesh, double[] x, double[] values) {
        double[] y = new double[x.length];
        System.arraycopy(values, firstInterior(mesh), y, 0, y.length);
        return new LinearInterpolator().interpolate(x, y);
    }

    /**
     * Where a point at exterior fraction (M - m)/M = e lies between the last interior point (weight 0) and the
     * surface (1), for a point in the outermost interval: linear in ln P with P - P_surface in proportion to M - m
     * (hydrostatic equilibrium at nearly constant g and r; the rule the mesh planner places and fills such points
     * by), ln P taken as ln rho + ln T (ideal gas of fixed mean molecular weight across the interval). Holding the
     * last interior point's values there instead (a clamp) put errors of ~0.1 in ln rho into the carried model's
     * outermost points, and so into the first step after each remesh before the zero-age main sequence.
     */
    private static double outerWeight(ModelState state, double e) {
        int n = state.size();
        double span = state.lnDensity(n - 2) + state.lnTemperature(n - 2) - state.lnDensity(n - 1)
                - state.lnTemperature(n - 1);
        double edge = state.mesh().exteriorFraction(n - 2);
        if (!(span > 1.0e-6) || !(edge > 0.0)) {
            return Math.min(1.0, Math.max(0.0, 1.0 - e / edge));
        }
        double w = 1.0 - Math.log1p(e / edge * Math.expm1(span)) / span;
        return Math.min(1.0, Math.max(0.0, w));
    }
}
