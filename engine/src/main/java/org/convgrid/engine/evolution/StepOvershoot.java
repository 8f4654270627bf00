package org.convgrid.engine.evolution;

import org.convgrid.engine.structure.MassMesh;
import org.convgrid.engine.structure.StellarProfile;

/**
 * Step overshoot (common practice, no single source): the mixed region of every convective zone of the previous model
 * reaches a distance d_ov = alpha_ov min(H_P, dr_zone) beyond each formal boundary that is not the centre or the
 * surface, H_P the pressure scale height at the boundary and dr_zone the radial extent of the zone (for a core,
 * r_core: the usual limit for small cores, common practice without a single source). Formal boundaries are the
 * sign changes of the stability excess interpolated linearly between mesh points (common practice); the
 * overshoot edge is turned into a mass by linear interpolation of m(r). Only the mixing is extended: the
 * temperature gradient of the overshoot layer stays the radiative one, since the structure equations are
 * untouched (a choice; common practice allows either). Stateless.
 */
final class StepOvershoot {

    private StepOvershoot() {
    }

    /**
     * The points of {@code mesh} to be homogenised: the convective flags ({@code convective}, on {@code mesh})
     * joined with every point whose mass lies within an overshoot-extended zone of {@code previous}.
     *
     * @param previous the converged model the step starts from (its own mesh)
     * @param alpha alpha_ov, pressure scale heights (0 returns a copy of {@code convective})
     */
    static boolean[] mixedPoints(MassMesh mesh, boolean[] convective, StellarProfile previous, double alpha) {
        boolean[] mixed = convective.clone();
        if (!(alpha > 0.0)) {
            return mixed;
        }
        int n = previous.size();
        int k = 0;
        while (k < n) {
            if (!previous.convective(k)) {
                k++;
                continue;
            }
            int end = k;
            while (end + 1 < n && previous.convective(end + 1)) {
                end++;
            }
            double rIn = k == 0 ? 0.0 : boundaryRadius(previous, k - 1);
            double rOut = end == n - 1 ? previous.radius(n - 1) : boundaryRadius(previous, end);
            double extent = rOut - rIn;
            double mLo = k == 0 ? 0.0 : massAt(previous,
                    rIn - alpha * Math.min(boundaryScaleHeight(previous, k - 1), extent));
            double mHi = end == n - 1 ? Double.POSITIVE_INFINITY : massAt(previous,
                    rOut + alpha * Math.min(boundaryScaleHeight(previous, end), extent));
            for (int j = 0; j < mixed.length; j++) {
                double m = mesh.mass(j);
                if (m >= mLo && m <= mHi) {
                    mixed[j] = true;
                }
            }
            k = end + 1;
        }
        return mixed;
    }

    /** Fraction of interval (k, k + 1) at which the stability excess changes sign (0.5 if it cannot tell). */
    private static double crossing(StellarProfile p, int k) {
        double a = p.stabilityExcess(k);
        double b = p.stabilityExcess(k + 1);
        double f = a / (a - b);
        return Double.isFinite(f) && f >= 0.0 && f <= 1.0 ? f : 0.5;
    }

    static double boundaryRadius(StellarProfile p, int k) {
        double f = crossing(p, k);
        return p.radius(k) + f * (p.radius(k + 1) - p.radius(k));
    }

    static double boundaryScaleHeight(StellarProfile p, int k) {
        double f = crossing(p, k);
        return p.pressureScaleHeight(k) + f * (p.pressureScaleHeight(k + 1) - p.pressureScaleHeight(k));
    }

    /** m(r) by linear interpolation between mesh points (r increases outwards), clamped to the mesh. */
    static double massAt(StellarProfile p, double r) {
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
