package org.convgrid.engine.structure;

/**
 * Sound travel times through a model: the acoustic radius T = integral of dr / c from the centre to the surface, and
 * the acoustic depth tau(r) = integral of dr / c from r to the surface, c = sqrt(Gamma1 P / rho) the adiabatic sound
 * speed. In the asymptotic theory of high-order p modes the large separation is Delta nu = 1 / (2 T) (Tassoul 1980,
 * ApJS 43, 469; Aerts, Christensen-Dalsgaard &amp; Kurtz 2010, "Asteroseismology", ch. 3), and a sharp feature of the
 * sound speed at acoustic depth tau, such as the base of a convective envelope, modulates the frequencies with a
 * period of 1 / (2 tau) in frequency (Gough 1990, in "Progress of Seismology of the Sun and Stars", LNP 367, 283;
 * Monteiro, Christensen-Dalsgaard &amp; Thompson 1994, A&amp;A 283, 247; both references from memory): the "acoustic
 * glitch" fits of solar-like oscillators measure that tau.
 *
 * <p>The integrals are trapezoids in r on the model's own points, 1 / c linear across each interval, measured from
 * the model's surface (the photosphere, where the structure meets the grey atmosphere). The layers above the
 * photosphere, where the p modes are reflected and which glitch fits include in their "acoustic surface", are not in
 * the model, so depths measured from a star's frequencies refer to a surface a little higher. Below the innermost
 * point (no mesh has a point at r = 0) the sound speed is taken as constant: it is flat at the centre (dc/dr = 0 by
 * symmetry). Stateless.
 */
public final class AcousticTravelTime {

    private AcousticTravelTime() {
    }

    /**
     * The adiabatic sound speed sqrt(Gamma1 P / rho) at every point of a solved model, cm s^-1, Gamma1 from the
     * equation of state the model was solved with (the profiles' {@code sound_speed_cgs}).
     */
    public static double[] soundSpeeds(StellarModel model) {
        StellarProfile p = model.profile();
        double[] c = new double[p.size()];
        for (int k = 0; k < c.length; k++) {
            c[k] = Math.sqrt(p.eosState(k).gamma1() * p.pressure(k) / p.density(k));
        }
        return c;
    }

    /**
     * The acoustic radius T, s: the sound's travel time from the centre to the surface.
     *
     * @param radius r at each point, cm, strictly increasing, all above 0 (the last point is the surface)
     * @param soundSpeed c at each point, cm s^-1, all above 0
     */
    public static double acousticRadius(double[] radius, double[] soundSpeed) {
        check(radius, soundSpeed);
        return radius[0] / soundSpeed[0] + depthFrom(radius, soundSpeed, 0);
    }

    /**
     * The acoustic depth tau of radius r below the surface, s; 1 / c interpolated linearly in r inside the interval
     * that holds r. Below the innermost point, that point's 1 / c.
     *
     * @param radius r at each point, cm, strictly increasing, all above 0 (the last point is the surface)
     * @param soundSpeed c at each point, cm s^-1, all above 0
     * @param r the radius, cm, from 0 to the surface
     */
    public static double depthAt(double[] radius, double[] soundSpeed, double r) {
        check(radius, soundSpeed);
        int n = radius.length;
        if (!(r >= 0.0 && r <= radius[n - 1])) {
            throw new IllegalArgumentException("the radius must lie between the centre and the surface, 0 to "
                    + radius[n - 1] + " cm: " + r);
        }
        if (r <= radius[0]) {
            return (radius[0] - r) / soundSpeed[0] + depthFrom(radius, soundSpeed, 0);
        }
        int k = 1;
        while (radius[k] < r) {
            k++;
        }
        // r lies in (radius[k - 1], radius[k]]: the part of that interval above r, then every interval above it
        double slownessBelow = 1.0 / soundSpeed[k - 1];
        double slownessAbove = 1.0 / soundSpeed[k];
        double weight = (r - radius[k - 1]) / (radius[k] - radius[k - 1]);
        double slownessAtR = slownessBelow + weight * (slownessAbove - slownessBelow);
        return 0.5 * (slownessAtR + slownessAbove) * (radius[k] - r) + depthFrom(radius, soundSpeed, k);
    }

    /** The trapezoid of 1 / c from point k to the surface, s. */
    private static double depthFrom(double[] radius, double[] soundSpeed, int k) {
        double sum = 0.0;
        for (int j = k + 1; j < radius.length; j++) {
            sum += 0.5 * (1.0 / soundSpeed[j - 1] + 1.0 / soundSpeed[j]) * (radius[j] - radius[j - 1]);
        }
        return sum;
    }

    /**
     * Whether the integrals can be formed: as many sound speeds as radii, the radii all above 0 and strictly
     * increasing, the sound speeds all above 0. A caller that must not fail (every step of an evolution asks for the
     * travel times) asks this first; the integrals themselves throw, saying which point is wrong.
     */
    public static boolean integrable(double[] radius, double[] soundSpeed) {
        if (radius.length != soundSpeed.length || !BuoyancyTravelTime.increasingFromAboveZero(radius)) {
            return false;
        }
        for (double c : soundSpeed) {
            if (!(c > 0.0)) {
                return false;
            }
        }
        return true;
    }

    private static void check(double[] radius, double[] soundSpeed) {
        if (radius.length != soundSpeed.length || radius.length == 0) {
            throw new IllegalArgumentException("need as many sound speeds as radii, at least one: " + radius.length
                    + " radii, " + soundSpeed.length + " sound speeds");
        }
        if (!(radius[0] > 0.0)) {
            throw new IllegalArgumentException("the innermost radius must be above 0: " + radius[0]);
        }
        for (int k = 0; k < radius.length; k++) {
            if (k > 0 && !(radius[k] > radius[k - 1])) {
                throw new IllegalArgumentException("radii must increase: r[" + k + "] = " + radius[k] + " after "
                        + radius[k - 1]);
            }
            if (!(soundSpeed[k] > 0.0)) {
                throw new IllegalArgumentException("sound speeds must be above 0: c[" + k + "] = " + soundSpeed[k]);
            }
        }
    }
}
