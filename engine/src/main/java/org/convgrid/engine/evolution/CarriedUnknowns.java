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
        double[][] values = {state.lnRadii(), state.lnDensities(), state.lnTemperatures(), state.luminosities()};
        MassMesh mesh = state.mesh();
        if (mesh == target) {
            return values;
        }
        int n = mesh.size();
        int first = Double.isFinite(mesh.logit(0)) ? 0 : 1;
        int last = n - 2;
        double[] x = new double[last - first + 1];
        for (int k = first; k <= last; k++) {
            x[k - first] = mesh.logit(k);
        }
        int m = target.size();
        double[][] carried = new double[values.length][m];
        LinearInterpolator interpolator = new LinearInterpolator();
        for (int v = 0; v < values.length; v++) {
            double[] y = new double[x.length];
            System.arraycopy(values[v], first, y, 0, y.length);
            PolynomialSplineFunction line = interpolator.interpolate(x, y);
            carried[v][0] = values[v][0];
            carried[v][m - 1] = values[v][n - 1];
            for (int k = 1; k < m - 1; k++) {
                double at = Math.min(Math.max(target.logit(k), x[0]), x[x.length - 1]);
                carried[v][k] = line.value(at);
            }
        }
        return carried;
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
        int first = Double.isFinite(mesh.logit(0)) ? 0 : 1;
        int last = n - 2;
        double[] x = new double[last - first + 1];
        for (int k = first; k <= last; k++) {
            x[k - first] = mesh.logit(k);
        }
        double[] y = new double[x.length];
        System.arraycopy(values, first, y, 0, y.length);
        PolynomialSplineFunction line = new LinearInterpolator().interpolate(x, y);
        int m = target.size();
        double[] carried = new double[m];
        carried[0] = values[0];
        carried[m - 1] = values[n - 1];
        for (int k = 1; k < m - 1; k++) {
            carried[k] = line.value(Math.min(Math.max(target.logit(k), x[0]), x[x.length - 1]));
        }
        return carried;
    }
}
