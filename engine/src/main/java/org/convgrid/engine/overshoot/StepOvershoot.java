package org.convgrid.engine.overshoot;

import java.util.Optional;
import java.util.function.IntToDoubleFunction;

/**
 * Step overshoot (common practice, no single source): the mixed region of every convective zone of the previous model
 * reaches a distance d_ov = alpha_ov min(H_P, dr_zone) beyond each formal boundary that is not the centre or the
 * surface, H_P the pressure scale height at the boundary and dr_zone the radial extent of the zone (for a core,
 * r_core: the usual limit for small cores, common practice without a single source). Formal boundaries are the
 * sign changes of the stability excess interpolated linearly between mesh points (common practice); the
 * overshoot edge is turned into a mass by linear interpolation of m(r). Only the mixing is extended: the
 * temperature gradient of the overshoot layer stays the radiative one, since the structure equations are
 * untouched (a choice; common practice allows either). Stateless.
 *
 * @param alpha alpha_ov, pressure scale heights (0: no overshoot)
 */
public record StepOvershoot(double alpha) implements Overshoot {

    /** The grid-file name of this scheme. */
    public static final String LABEL = "uniform";

    @Override
    public String label() {
        return LABEL;
    }

    @Override
    public double parameter() {
        return alpha;
    }

    /**
     * The convective flags joined with every point whose mass lies within an overshoot-extended zone of
     * {@code previous} (alpha = 0 returns a copy of {@code convective}).
     */
    @Override
    public boolean[] mixedPoints(IntToDoubleFunction massAt, boolean[] convective, OvershootProfile previous) {
        boolean[] mixed = convective.clone();
        if (!(alpha > 0.0)) {
            return mixed;
        }
        int n = previous.size();
        ConvectiveRuns.forEach(previous, (k, end) -> {
            double rIn = k == 0 ? 0.0 : ConvectiveRuns.boundaryRadius(previous, k - 1);
            double rOut = end == n - 1 ? previous.radius(n - 1) : ConvectiveRuns.boundaryRadius(previous, end);
            double extent = rOut - rIn;
            double mLo = k == 0 ? 0.0 : massAt(previous,
                    rIn - alpha * Math.min(ConvectiveRuns.boundaryScaleHeight(previous, k - 1), extent));
            double mHi = end == n - 1 ? Double.POSITIVE_INFINITY : edgeAbove(previous, end, extent);
            for (int j = 0; j < mixed.length; j++) {
                double m = massAt.applyAsDouble(j);
                if (m >= mLo && m <= mHi) {
                    mixed[j] = true;
                }
            }
        });
        return mixed;
    }

    /** The edge above the central zone, as {@link #mixedPoints} mixes to it; NaN without one (see the interface). */
    @Override
    public double mixedCoreTop(OvershootProfile profile) {
        if (!(alpha > 0.0) || !profile.convective(0)) {
            return Double.NaN;
        }
        int end = ConvectiveRuns.lastOfZone(profile, 0);
        return end == profile.size() - 1 ? Double.NaN
                : edgeAbove(profile, end, ConvectiveRuns.boundaryRadius(profile, end));
    }

    /**
     * The mass at alpha_ov min(H_P, extent) above the boundary in interval (end, end + 1), g.
     *
     * @param extent the zone's radial extent, cm
     */
    private double edgeAbove(OvershootProfile p, int end, double extent) {
        double rOut = ConvectiveRuns.boundaryRadius(p, end);
        return massAt(p, rOut + alpha * Math.min(ConvectiveRuns.boundaryScaleHeight(p, end), extent));
    }

    /** Step overshoot mixes instantaneously; it adds no diffusion. */
    @Override
    public Optional<double[]> diffusion(OvershootProfile previous, double mixingLength) {
        return Optional.empty();
    }

    /** m(r) by linear interpolation between mesh points (r increases outwards), clamped to the mesh. */
    private static double massAt(OvershootProfile p, double r) {
        int n = p.size();
        if (r <= p.radius(0)) {
            return r <= 0.0 ? 0.0 : p.mass(0);
        }
        if (r >= p.radius(n - 1)) {
            return p.mass(n - 1);
        }
        int lo = 0;
        int hi = n - 1;
        while (hi - lo > 1) {
            int mid = (lo + hi) >>> 1;
            if (p.radius(mid) <= r) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        double f = (r - p.radius(lo)) / (p.radius(hi) - p.radius(lo));
        return p.mass(lo) + f * (p.mass(hi) - p.mass(lo));
    }
}
