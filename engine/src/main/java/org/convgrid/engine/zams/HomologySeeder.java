package org.convgrid.engine.zams;

import org.convgrid.engine.state.Composition;
import org.convgrid.engine.structure.MassMesh;
import org.convgrid.engine.structure.ModelState;
import org.convgrid.engine.structure.StellarModel;

/**
 * Starting guesses for a new mass from converged neighbours by homology scaling at fixed m/M
 * (Kippenhahn, Weigert &amp; Weiss 2012, ch. 20; formulas.md 6.5): with s = M'/M,
 * r' = r s^xR, P' = P s^(2 - 4 xR), T' = T s^(1 - xR), rho' = rho s^(1 - 3 xR), L' = L s^xL.
 * The exponents are measured from the two nearest converged models (finite differences in ln M) when two are
 * given, otherwise the defaults below are used. Immutable and thread-safe.
 */
public final class HomologySeeder {

    /** Radius exponent when only one neighbour is known (upper main sequence, formulas.md 6.5, rounded). */
    public static final double DEFAULT_RADIUS_EXPONENT = 0.8;
    /** Luminosity exponent when only one neighbour is known (rounded textbook mass-luminosity slope). */
    public static final double DEFAULT_LUMINOSITY_EXPONENT = 3.5;
    private static final double MIN_RADIUS_EXPONENT = 0.0;
    private static final double MAX_RADIUS_EXPONENT = 1.5;
    private static final double MIN_LUMINOSITY_EXPONENT = 0.5;
    private static final double MAX_LUMINOSITY_EXPONENT = 6.0;

    /**
     * Scales {@code nearest} to {@code mass}, with exponents measured against {@code other} when not null. The
     * shells keep the neighbour's compositions (with 3He and CN already near their equilibrium values), which
     * starts the new model closer to its own zero-age state than the initial composition would.
     *
     * @param mass target mass, g
     */
    public ModelState seed(StellarModel nearest, StellarModel other, double mass) {
        double xR = DEFAULT_RADIUS_EXPONENT;
        double xL = DEFAULT_LUMINOSITY_EXPONENT;
        if (other != null && other.mass() != nearest.mass()) {
            double dlnM = Math.log(nearest.mass() / other.mass());
            xR = clamp(Math.log(nearest.global().radius() / other.global().radius()) / dlnM,
                    MIN_RADIUS_EXPONENT, MAX_RADIUS_EXPONENT);
            xL = clamp(Math.log(nearest.global().luminosity() / other.global().luminosity()) / dlnM,
                    MIN_LUMINOSITY_EXPONENT, MAX_LUMINOSITY_EXPONENT);
        }
        return scale(nearest.state(), mass, xR, xL, null);
    }

    /**
     * Homology scaling of a state to {@code mass} with the given exponents.
     *
     * @param composition the homogeneous composition of the new state, or null to keep the state's compositions
     */
    public static ModelState scale(ModelState state, double mass, double xR, double xL, Composition composition) {
        double lnS = Math.log(mass / state.mesh().totalMass());
        MassMesh mesh = state.mesh().scaledTo(mass);
        int n = state.size();
        double[] lnR = state.lnRadii();
        double[] lnRho = state.lnDensities();
        double[] lnT = state.lnTemperatures();
        double[] lum = state.luminosities();
        double fL = Math.exp(xL * lnS);
        Composition[] comp = new Composition[n];
        for (int k = 0; k < n; k++) {
            lnR[k] += xR * lnS;
            lnRho[k] += (1.0 - 3.0 * xR) * lnS;
            lnT[k] += (1.0 - xR) * lnS;
            lum[k] *= fL;
            comp[k] = composition == null ? state.composition(k) : composition;
        }
        return new ModelState(mesh, comp, lnR, lnRho, lnT, lum);
    }

    private static double clamp(double v, double lo, double hi) {
        return Double.isFinite(v) ? Math.max(lo, Math.min(hi, v)) : 0.5 * (lo + hi);
    }
}
