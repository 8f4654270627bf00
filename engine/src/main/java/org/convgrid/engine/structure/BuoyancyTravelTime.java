package org.convgrid.engine.structure;

import org.convgrid.engine.convection.StructureClass;

/**
 * The buoyancy travel time Pi_0 = 2 pi^2 / (integral of N dr / r over the g-mode cavity, where N^2 &gt; 0), the period
 * scale of high-order g modes, and the asymptotic period spacing of degree l, Delta Pi_l = Pi_0 / sqrt(l (l + 1))
 * (Tassoul 1980, ApJS 43, 469, first-order asymptotics; Aerts, Christensen-Dalsgaard &amp; Kurtz 2010,
 * "Asteroseismology", ch. 3; equation numbers from memory, not checked). gamma Dor and SPB pulsators show the dipole
 * spacing Delta Pi_1 = Pi_0 / sqrt 2.
 *
 * <p>The integral is a trapezoid in r on the model's own points, with N = sqrt(max(N^2, 0)): a point where N^2 &lt;= 0
 * counts as N = 0. So an interval whose ends straddle a change of sign takes half its positive end's N / r times its
 * width, as if N fell linearly to zero across it. Locating the zero by interpolation would need N^2 to be smooth there,
 * and it is not: the cavity's edges are a convective zone's edge, where N^2 jumps from about zero (or a slightly
 * negative superadiabatic value) to the radiative value, or a composition step left by a receding core, which the
 * fixed mesh does not resolve. The half interval is the rule a user applying numpy's trapezoid to the profile's clipped
 * {@code buoyancy_n2_cgs} and {@code radius_cm} gets, so the two agree (1.5 Msun, Z = 0.02, 1 Gyr, measured before
 * the main-sequence steps came to follow a receding core, which moved it to 4165 s: 4195 s both;
 * counting only intervals whose two ends are positive reads 4222 s, 0.6 % higher, which bounds what the rule decides).
 *
 * <p>Below the innermost point (no mesh has a point at r = 0; ours start at m/M ~ 1e-6) the integral adds N there:
 * N grows as r from the centre (N^2 ~ r^2, since g ~ r), so N / r is about constant over that segment. It is zero in a
 * star with a convective core and 1.3 % of the total in the Sun-like 1 Msun, Z = 0.02, at 4.57 Gyr (Pi_0 2217 s, 2245 s
 * without it), which a plain trapezoid on the profile's rows leaves out.
 *
 * <p>The cavity is every point with N^2 &gt; 0, the thin stable layer above a surface convection zone included (2.4 %
 * of the integral in 1.5 Msun at 1 Gyr, outside r/R 0.9). Stateless.
 */
public final class BuoyancyTravelTime {

    private static final double TWO_PI_SQUARED = 2.0 * Math.PI * Math.PI;

    private BuoyancyTravelTime() {
    }

    /**
     * Pi_0 of a solved model, s; NaN for a fully convective star, which has no g-mode cavity. Its N^2 is nowhere
     * positive today (0.2 Msun, Z = 0.02, 1 Gyr: none of 500 points), but a stable point or two in its atmosphere
     * would otherwise give a Pi_0 of no meaning, so the structure class decides. NaN too when the integral cannot be
     * formed on the model's mesh (radii not all above 0 and increasing; no solved model of ours has been seen so):
     * every step of an evolution asks for it, and a track or catalogue row must not be lost to a number it reports.
     */
    public static double of(StellarModel model) {
        if (model.convection().structureClass() == StructureClass.FULLY_CONVECTIVE) {
            return Double.NaN;
        }
        double[] radius = model.profile().radii();
        if (!increasingFromAboveZero(radius)) {
            return Double.NaN;
        }
        return of(radius, BuoyancyFrequency.squaredOf(model));
    }

    /**
     * Whether the radii are all above 0 and strictly increasing, as {@link #cavityIntegral} and {@link
     * AcousticTravelTime} need them.
     */
    static boolean increasingFromAboveZero(double[] radius) {
        if (radius.length == 0 || !(radius[0] > 0.0)) {
            return false;
        }
        for (int k = 1; k < radius.length; k++) {
            if (!(radius[k] > radius[k - 1])) {
                return false;
            }
        }
        return true;
    }

    /**
     * Pi_0 from N^2 on a mesh, s; NaN when N^2 is nowhere positive.
     *
     * @param radius r at each point, cm, strictly increasing, all above 0
     * @param buoyancySquared N^2 at each point, s^-2
     */
    public static double of(double[] radius, double[] buoyancySquared) {
        double integral = cavityIntegral(radius, buoyancySquared);
        return integral > 0.0 ? TWO_PI_SQUARED / integral : Double.NaN;
    }

    /**
     * The integral of N dr / r over the points where N^2 &gt; 0 (the rules of the class comment), s^-1.
     *
     * @param radius r at each point, cm, strictly increasing, all above 0
     * @param buoyancySquared N^2 at each point, s^-2
     */
    public static double cavityIntegral(double[] radius, double[] buoyancySquared) {
        if (radius.length != buoyancySquared.length || radius.length == 0) {
            throw new IllegalArgumentException("need as many N^2 values as radii, at least one: " + radius.length
                    + " radii, " + buoyancySquared.length + " N^2");
        }
        if (!(radius[0] > 0.0)) {
            throw new IllegalArgumentException("the innermost radius must be above 0 (N / r has no value at r = 0): "
                    + radius[0]);
        }
        double previous = frequencyOverRadius(radius[0], buoyancySquared[0]);
        // the centre's segment: N / r about constant from r = 0 to the innermost point
        double sum = previous * radius[0];
        for (int k = 1; k < radius.length; k++) {
            if (!(radius[k] > radius[k - 1])) {
                throw new IllegalArgumentException("radii must increase: r[" + k + "] = " + radius[k] + " after "
                        + radius[k - 1]);
            }
            double current = frequencyOverRadius(radius[k], buoyancySquared[k]);
            sum += 0.5 * (previous + current) * (radius[k] - radius[k - 1]);
            previous = current;
        }
        return sum;
    }

    /**
     * The asymptotic period spacing of consecutive radial orders at degree l, s.
     *
     * @param buoyancyTravelTime Pi_0, s
     * @param degree l, at least 1 (radial modes are not g modes)
     */
    public static double periodSpacing(double buoyancyTravelTime, int degree) {
        if (degree < 1) {
            throw new IllegalArgumentException("g modes have degree 1 or more, got " + degree);
        }
        return buoyancyTravelTime / Math.sqrt(degree * (degree + 1.0));
    }

    /** N / r at one point, N taken as zero where N^2 is not positive (NaN too: a point outside the cavity). */
    private static double frequencyOverRadius(double radius, double buoyancySquared) {
        return buoyancySquared > 0.0 ? Math.sqrt(buoyancySquared) / radius : 0.0;
    }
}
