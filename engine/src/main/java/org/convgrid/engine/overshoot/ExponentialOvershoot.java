package org.convgrid.engine.overshoot;

import org.convgrid.engine.convection.ConvectiveZoneFinder;

import java.util.Optional;
import java.util.function.IntToDoubleFunction;

/**
 * Exponential diffusive overshoot (Freytag, Ludwig &amp; Steffen 1996, A&amp;A 313, 497; Herwig 2000, A&amp;A 360,
 * 952): beyond every formal boundary of a convective zone of the previous model that is not the
 * centre or the surface, D_ov(z) = D_0 exp(-2 z/(f H_P)), z the radial distance from the boundary, H_P the
 * pressure scale height at the boundary and D_0 = v_c l_m/3 (l_m = alpha H_P) the mixing-length diffusion
 * coefficient a distance f0 H_P inside the boundary, here with f0 = f (a choice; Herwig 2000 leaves f0 open).
 * A zone whose top lies in the surface skin ({@link ConvectiveZoneFinder#DEFAULT_SURFACE_SKIN_MASS_FRACTION} of the
 * mass, the few radiative points of the atmosphere) reaches the surface: no diffusion above it. Diffusing the
 * surface zone's large D_0 into the atmosphere's points made every pre-main-sequence star we tried (1.0, 1.5, 2.0
 * Msun, Z = 0.02, f = 0.016) fail within its first 2 Myr, its step budget spent at X_c = 0.700 (StarOvershootTest).
 * Boundaries are located as in {@link StepOvershoot}. Where zones overlap the larger D wins. The returned S =
 * (4 pi r^2 rho)^2 D feeds the evolution's implicit diffusion step; the convective points themselves are
 * mixed instantaneously by the evolution.
 *
 * @param f e-folding parameter of the exponential, pressure scale heights (0: no overshoot)
 */
public record ExponentialOvershoot(double f) implements Overshoot {

    /** The grid-file name of this scheme. */
    public static final String LABEL = "decaying";

    private static final double FOUR_PI = 4.0 * Math.PI;
    /**
     * {@link #mixedCoreTop}: the hydrogen counts as the centre's while it exceeds X_c by at most this share of the
     * star's surface-minus-centre contrast. Our choice; no published source.
     */
    static final double MIXED_SHARE = 0.01;
    /** {@link #mixedCoreTop}: below this surface-minus-centre contrast in X, nothing shows where mixing ended. */
    static final double MIN_CONTRAST = 1.0e-3;


    @Override
    public String label() {
        return LABEL;
    }

    @Override
    public double parameter() {
        return f;
    }

    /**
     * The mass up to which the diffusion has kept the central zone's hydrogen: the first point above the zone whose
     * X exceeds X_c by more than {@link #MIXED_SHARE} of the surface-minus-centre contrast, interpolated in mass.
     * The diffusion has no sharp edge, so the composition says how far it reached: the hydrogen was at the
     * centre's value (X 0.50213) out to m/M 0.170 around a core whose top is at 0.133 (2 Msun, Z =
     * 0.02, f = 0.02, 0.6 Gyr), where this column had said the core top. It also counts the layer a receding core
     * has just left, whose hydrogen is still close to the centre's. NaN (the core top is the answer) when f = 0,
     * without a central zone or with one reaching the surface, and while the contrast is under
     * {@link #MIN_CONTRAST} (a homogeneous or nearly unburnt star shows no edge).
     */
    @Override
    public double mixedCoreTop(OvershootProfile profile) {
        if (!(f > 0.0) || !profile.convective(0)) {
            return Double.NaN;
        }
        int n = profile.size();
        int end = ConvectiveRuns.lastOfZone(profile, 0);
        double centre = profile.hydrogen(0);
        double contrast = profile.hydrogen(n - 1) - centre;
        if (end == n - 1 || !(contrast >= MIN_CONTRAST)) {
            return Double.NaN;
        }
        double limit = centre + MIXED_SHARE * contrast;
        for (int k = end + 1; k < n; k++) {
            double x = profile.hydrogen(k);
            if (x > limit) {
                double below = profile.hydrogen(k - 1);
                double w = below >= limit ? 0.0 : (limit - below) / (x - below);
                return profile.mass(k - 1) + w * (profile.mass(k) - profile.mass(k - 1));
            }
        }
        return Double.NaN;
    }

    /** Only the convective points: this scheme mixes beyond them by diffusion. */
    @Override
    public boolean[] mixedPoints(IntToDoubleFunction massAt, boolean[] convective, OvershootProfile previous) {
        return convective.clone();
    }

    /** {@link #coefficients}, or empty when f = 0 (no diffusion step at all). */
    @Override
    public Optional<double[]> diffusion(OvershootProfile previous, double mixingLength) {
        return f > 0.0 ? Optional.of(coefficients(previous, mixingLength, f)) : Optional.empty();
    }

    /**
     * S = (4 pi r^2 rho)^2 D_ov per point of {@code previous}, g^2 s^-1 (0 inside convective zones and where no
     * boundary reaches).
     *
     * @param alpha mixing length, pressure scale heights
     * @param f e-folding parameter of the exponential, pressure scale heights (0 returns all zeros)
     */
    static double[] coefficients(OvershootProfile previous, double alpha, double f) {
        int n = previous.size();
        double[] d = new double[n];
        if (!(f > 0.0)) {
            return d;
        }
        ConvectiveRuns.forEach(previous, (k, end) -> {
            if (k > 0) {
                boundary(previous, k - 1, -1.0, alpha, f, d);
            }
            if (end < n - 1 && !ConvectiveZoneFinder.reachesSurface(previous.mass(end) / previous.mass(n - 1),
                    ConvectiveZoneFinder.DEFAULT_SURFACE_SKIN_MASS_FRACTION)) {
                boundary(previous, end, 1.0, alpha, f, d);
            }
        });
        double[] s = new double[n];
        for (int j = 0; j < n; j++) {
            double area = FOUR_PI * previous.radius(j) * previous.radius(j) * previous.density(j);
            s[j] = area * area * d[j];
        }
        return s;
    }

    /**
     * Adds the profile of the boundary in interval (k, k + 1); {@code outward} +1 when the stable side is outside
     * (the zone's upper edge), -1 when it is inside.
     */
    private static void boundary(OvershootProfile p, int k, double outward, double alpha, double f, double[] d) {
        double rb = ConvectiveRuns.boundaryRadius(p, k);
        double hb = ConvectiveRuns.boundaryScaleHeight(p, k);
        double r0 = rb - outward * f * hb;
        double d0 = at(p, p.convectiveVelocities(), r0) * alpha * at(p, p.pressureScaleHeights(), r0) / 3.0;
        if (!(d0 > 0.0)) {
            return;
        }
        for (int j = 0; j < p.size(); j++) {
            double z = outward * (p.radius(j) - rb);
            if (z > 0.0 && !p.convective(j)) {
                d[j] = Math.max(d[j], d0 * Math.exp(-2.0 * z / (f * hb)));
            }
        }
    }

    /** {@code values} (on the points of p) interpolated linearly in radius, clamped to the mesh. */
    private static double at(OvershootProfile p, double[] values, double r) {
        int n = p.size();
        if (r <= p.radius(0)) {
            return values[0];
        }
        if (r >= p.radius(n - 1)) {
            return values[n - 1];
        }
        int lo = 0;
        while (lo < n - 2 && p.radius(lo + 1) <= r) {
            lo++;
        }
        double w = (r - p.radius(lo)) / (p.radius(lo + 1) - p.radius(lo));
        return values[lo] + w * (values[lo + 1] - values[lo]);
    }
}
