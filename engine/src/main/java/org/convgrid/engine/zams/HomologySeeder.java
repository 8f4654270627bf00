package org.convgrid.engine.zams;

import org.convgrid.engine.state.Composition;
import org.convgrid.engine.structure.MassMesh;
import org.convgrid.engine.structure.ModelState;
import org.convgrid.engine.structure.StellarModel;

/**
 * Starting guesses for a new mass from converged neighbours by homology scaling at fixed m/M
 * (Kippenhahn, Weigert &amp; Weiss 2012, ch. 20): with s = M'/M,
 * r' = r s^xR, P' = P s^(2 - 4 xR), T' = T s^(1 - xR), rho' = rho s^(1 - 3 xR), L' = L s^xL.
 * The exponents are measured from the two nearest converged models (finite differences in ln M), shell by shell
 * when the second model is close enough ({@link #extrapolate}), otherwise globally from their radii and
 * luminosities, or the defaults below when only one model is known. Shells a convective zone has just left are not
 * extrapolated ({@link #RECEDING_ZONE_EXPONENT}). Immutable and thread-safe.
 */
public final class HomologySeeder {

    /**
     * Radius exponent when only one neighbour is known (upper main sequence: electron scattering and CNO burning
     * give R ~ M^0.81, Kippenhahn, Weigert &amp; Weiss 2012, ch. 20, derived and rounded).
     */
    public static final double DEFAULT_RADIUS_EXPONENT = 0.8;
    /** Luminosity exponent when only one neighbour is known (rounded textbook mass-luminosity slope). */
    public static final double DEFAULT_LUMINOSITY_EXPONENT = 3.5;
    /** Neighbours closer than this in ln M are not used to measure exponents shell by shell. */
    public static final double MIN_NEIGHBOUR_SPACING = 1.0e-3;
    /** Shell-by-shell extrapolation reaches at most this many neighbour spacings; beyond, global homology. */
    public static final double MAX_EXTRAPOLATION = 2.0;
    /**
     * A shell that is radiative in the nearer model but convective in the other, and whose ln T or ln rho changed
     * between them by more than this many times their ln M spacing (homology gives exponents of order one), keeps
     * the nearer model's ln T and ln rho instead of being extrapolated: the change came from the switch of the
     * temperature gradient as a convective zone receded over the shell, which does not happen to it again.
     * Measured where the outer convective envelope thins (X = 0.7062, Z = 0.0188, from neighbours at 1.40 and
     * 1.45 Msun to 1.50 Msun, its base at 1 - m/M = 3e-6, 8e-8 and 5e-9): those shells changed by up to 0.48 in
     * ln T (an exponent of ~14), the extrapolation put them 0.42 off the solution, the nearer model's values 0.04
     * off, and the relaxation took 7 Newton iterations instead of 8 (the interior seed is within ~3e-3). At the
     * edge of a convective core the changes stay near the homology ones and the extrapolation is kept. Only for a
     * mass beyond the nearer model: between the two models the zone may still cover the shell.
     */
    public static final double RECEDING_ZONE_EXPONENT = 3.0;
    private static final double MIN_RADIUS_EXPONENT = 0.0;
    private static final double MAX_RADIUS_EXPONENT = 1.5;
    private static final double MIN_LUMINOSITY_EXPONENT = 0.5;
    private static final double MAX_LUMINOSITY_EXPONENT = 6.0;

    /**
     * Scales {@code nearest} to {@code mass}. With a second neighbour {@code other} not too far away the
     * exponents are measured shell by shell ({@link #extrapolate}); otherwise the global homology relations are
     * used with xR and xL measured from the two models' radii and luminosities (or the defaults). The
     * shells keep the neighbour's compositions (with 3He and CN already near their equilibrium values), which
     * starts the new model closer to its own zero-age state than the initial composition would.
     *
     * @param mass target mass, g
     */
    public ModelState seed(StellarModel nearest, StellarModel other, double mass) {
        if (other != null) {
            double spacing = Math.abs(Math.log(nearest.mass() / other.mass()));
            double reach = Math.abs(Math.log(mass / nearest.mass()));
            if (spacing >= MIN_NEIGHBOUR_SPACING && reach <= MAX_EXTRAPOLATION * spacing) {
                return extrapolate(nearest.state(), other.state(), mass, convectiveShells(nearest),
                        convectiveShells(other));
            }
        }
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

    /**
     * Per-shell linear extrapolation in ln M at fixed m/M from the two nearest models (the homology relations
     * with exponents measured shell by shell): ln r, ln rho, ln T and ln L ({@link #extrapolatedLuminosity}) of
     * {@code nearest} are moved along the difference to {@code other}, interpolated onto the nearest model's mesh in
     * ln(m/(M - m)).
     *
     * @param mass target mass, g
     */
    public ModelState extrapolate(ModelState nearest, ModelState other, double mass) {
        return extrapolate(nearest, other, mass, null, null);
    }

    /**
     * As {@link #extrapolate(ModelState, ModelState, double)}, holding the shells a convective zone has receded from
     * ({@link #RECEDING_ZONE_EXPONENT}).
     *
     * @param nearestConvective per point of {@code nearest}, whether it is convective; null for no such shells
     * @param otherConvective per point of {@code other}, whether it is convective; null for no such shells
     */
    public ModelState extrapolate(ModelState nearest, ModelState other, double mass, boolean[] nearestConvective,
                                  boolean[] otherConvective) {
        ModelState a = nearest;
        ModelState b = other;
        double ratio = Math.log(mass / a.mesh().totalMass()) / Math.log(a.mesh().totalMass() / b.mesh().totalMass());
        int n = a.size();
        double[] lnR = a.lnRadii();
        double[] lnRho = a.lnDensities();
        double[] lnT = a.lnTemperatures();
        double[] lum = a.luminosities();
        Composition[] comp = a.compositions();
        // only beyond the nearer model: between the two, the zone may still cover the shell at the new mass
        boolean zones = nearestConvective != null && otherConvective != null && ratio > 0.0;
        double largestChange = RECEDING_ZONE_EXPONENT
                * Math.abs(Math.log(a.mesh().totalMass() / b.mesh().totalMass()));
        int j = 0;
        for (int k = 0; k < n; k++) {
            double[] other4;
            boolean left = false;
            if (k == n - 1) {
                int s = b.size() - 1;
                other4 = new double[] {b.lnRadius(s), b.lnDensity(s), b.lnTemperature(s), b.luminosity(s)};
            } else {
                double u = a.mesh().logit(k);
                while (j < b.size() - 2 && b.mesh().logit(j + 1) < u) {
                    j++;
                }
                double ua = b.mesh().logit(j);
                double ub = j + 1 == b.size() - 1 ? Double.POSITIVE_INFINITY : b.mesh().logit(j + 1);
                double w = Double.isInfinite(ub) ? 0.0 : Math.max(0.0, Math.min(1.0, (u - ua) / (ub - ua)));
                other4 = new double[] {
                    (1 - w) * b.lnRadius(j) + w * b.lnRadius(j + 1),
                    (1 - w) * b.lnDensity(j) + w * b.lnDensity(j + 1),
                    (1 - w) * b.lnTemperature(j) + w * b.lnTemperature(j + 1),
                    (1 - w) * b.luminosity(j) + w * b.luminosity(j + 1)};
                // a convective zone of the other model has receded from this shell of the nearer one
                left = zones && !nearestConvective[k] && (otherConvective[j] || otherConvective[j + 1])
                        && Math.max(Math.abs(lnT[k] - other4[2]), Math.abs(lnRho[k] - other4[1])) > largestChange;
            }
            double thermal = left ? 0.0 : ratio;
            lnR[k] += ratio * (lnR[k] - other4[0]);
            lnRho[k] += thermal * (lnRho[k] - other4[1]);
            lnT[k] += thermal * (lnT[k] - other4[2]);
            lum[k] = extrapolatedLuminosity(lum[k], other4[3], ratio);
        }
        return new ModelState(a.mesh().scaledTo(mass), comp, lnR, lnRho, lnT, lum);
    }

    /**
     * The luminosity at fixed m/M extrapolated from {@code nearest} along its change from {@code other}: in ln L
     * where both are positive, as homology scales it (L' = L s^xL, xL measured between the two), linearly where
     * not (the centre). Linear in L, a whole 0.3 step in ln M from neighbours 0.3 apart gives L' = 2 L - L_other,
     * negative below 1 Msun (L ~ M^4.5 falls by three quarters from 1 to 0.74 Msun): every such seed of the ladder
     * was rejected and its step halved twice. In ln L the rungs of four lines of 50 masses 0.1-20 Msun (Z = 0.004
     * to 0.03) took 185-202 Newton iterations per line instead of 283-298 (LadderCostProbe), all below 1 Msun in
     * one step.
     */
    static double extrapolatedLuminosity(double nearest, double other, double ratio) {
        if (nearest > 0.0 && other > 0.0) {
            return nearest * Math.exp(ratio * Math.log(nearest / other));
        }
        return nearest + ratio * (nearest - other);
    }

    private static boolean[] convectiveShells(StellarModel model) {
        boolean[] convective = new boolean[model.profile().size()];
        for (int k = 0; k < convective.length; k++) {
            convective[k] = model.profile().convective(k);
        }
        return convective;
    }

    private static double clamp(double v, double lo, double hi) {
        return Double.isFinite(v) ? Math.max(lo, Math.min(hi, v)) : 0.5 * (lo + hi);
    }
}
