package org.convgrid.engine.convection;

import java.util.ArrayList;
import java.util.List;

import org.convgrid.engine.error.ConvgridException;

/**
 * Finds the convective zones of a model and the catalogue quantities derived from them (README, "Catalogue",
 * {@code catalogue.ecsv}). Immutable and thread-safe.
 *
 * <p>A mesh point is convective where the stability excess nabla_rad - nabla_stability is positive. Each zone
 * boundary lies where the linear interpolant of the excess between two mesh points changes sign; mass, radius
 * and H_P there are interpolated with the same weight (Kippenhahn, Weigert &amp; Weiss 2012, ch. 6). A zone that
 * contains the innermost point starts at the centre (m = r = 0); one that contains the outermost point ends at m/M =
 * r/R = 1. Every zone, however thin, is listed.
 *
 * <p>Roles and class:
 * <ul>
 * <li>The <em>core</em> is the zone that starts at the centre, provided its top exceeds the minimum core mass
 * fraction (default {@value #DEFAULT_MIN_CORE_MASS_FRACTION}, common practice: below it the "core" is a few
 * central mesh points, comparable with where the first mesh point sits).</li>
 * <li>The <em>envelope</em> is the outermost zone if it holds at least the minimum envelope mass fraction (default
 * {@value #DEFAULT_MIN_ENVELOPE_MASS_FRACTION}) and reaches the surface, i.e. the mass above its top is at
 * most the surface skin fraction (default {@value #DEFAULT_SURFACE_SKIN_MASS_FRACTION}). The skin exists because
 * in real envelopes the convective top lies a little below the fitting point, where the atmosphere T(tau) keeps
 * the layers just under the photosphere radiative; the skin is far below any envelope of interest.</li>
 * <li>The star is <em>fully convective</em> when one zone both starts at the centre and reaches the surface.
 * Any radiative shell between a core and an envelope, however thin, makes it conv_core_and_envelope: near the
 * fully convective limit such shells are physical (van Saders &amp; Pinsonneault 2012, ApJ 751, 98).</li>
 * </ul>
 * A fully convective star reports core mass fraction 1 and envelope base 0, as the catalogue requires.
 *
 * <p>Turnover times: the local time is l_m/v_c with l_m = alpha H_P, evaluated half a pressure
 * scale height above the envelope base, r = r_base + H_P(r_base)/2, but no higher than the envelope's radial
 * midpoint (where the base lies near the centre, H_P there is large, and the midpoint keeps the time continuous
 * with the fully convective star's, evaluated at R/2), as the catalogue column
 * {@code turnover_time_days} is defined (README, "Catalogue"). Gilliland 1985 (ApJ 299, 286) and Kim &amp; Demarque
 * 1996 (ApJ 457, 340) evaluate it half a mixing length above the base instead; the two points coincide for
 * alpha = 1 and differ by under one scale height for the usual alpha; H_P and v_c are linearly interpolated in r.
 * For a fully convective star there is
 * no base and the local time is evaluated at r = R/2. The global time is the integral of dr/v_c across the
 * envelope (Kim &amp; Demarque 1996), from its base (the interpolated boundary, where v_c = 0) to its top. In the
 * mixing-length theory v_c^2 is proportional to the superadiabatic excess (Boehm-Vitense 1958, Z. Astrophys. 46,
 * 108; Kippenhahn, Weigert &amp; Weiss 2012, mixing-length chapter), which vanishes linearly at a boundary, so 1/v_c
 * diverges there as (r - r_b)^(-1/2). Each interval is therefore integrated as if v_c^2 were linear in r across it,
 * which gives exactly 2 dr/(v_k + v_(k+1)), finite with v_c = 0 at one end; the partial intervals between the
 * boundaries and the first and last mesh points count, with v_c = 0 at the boundary. (A trapezoid rule on 1/v_c
 * instead made the time hinge on how close the first mesh point happened to lie to the base: up to 15 % between
 * meshes of the same model.) Both are NaN when there is no envelope, and the local time is NaN when v_c vanishes at
 * its evaluation point.
 */
public final class ConvectiveZoneFinder {

    /**
     * Default smallest m/M at the top of a central zone for it to count as a convective core: 1e-3, about one shell
     * of a typical mesh, below which "cores" come and go with resolution (common practice, no single published
     * value). The run's one core threshold: the class, the catalogue's core columns and the transitions use it.
     */
    public static final double DEFAULT_MIN_CORE_MASS_FRACTION = 1.0e-3;
    /**
     * Default smallest mass fraction of a surface zone for it to count as a convective envelope. The thin
     * hydrogen and helium ionisation zones of A and B stars hold ~1e-12 to 3e-8 of the mass (measured on our
     * 1.4-8 Msun models, Z = 0.008-0.02; up to 3e-7 just above the Teff where envelopes end): they are listed
     * among the zones but do not make the star a convective-envelope star; F-star envelopes, 1e-5 of the mass and
     * more, do count (common practice draws the line in this range; no single source).
     */
    public static final double DEFAULT_MIN_ENVELOPE_MASS_FRACTION = 1.0e-6;
    /** Default largest mass fraction above the top of a zone for it to count as reaching the surface. */
    public static final double DEFAULT_SURFACE_SKIN_MASS_FRACTION = 1.0e-6;
    /** Height of the local turnover point above the envelope base, in pressure scale heights (README, "Catalogue"). */
    public static final double TURNOVER_HEIGHT_SCALE_HEIGHTS = 0.5;

    private final double minCoreMassFraction;
    private final double surfaceSkinMassFraction;
    private final double minEnvelopeMassFraction;

    /** A finder with the default core threshold and surface skin. */
    public ConvectiveZoneFinder() {
        this(DEFAULT_MIN_CORE_MASS_FRACTION, DEFAULT_SURFACE_SKIN_MASS_FRACTION);
    }

    /** A finder with the default minimum envelope mass. */
    public ConvectiveZoneFinder(double minCoreMassFraction, double surfaceSkinMassFraction) {
        this(minCoreMassFraction, surfaceSkinMassFraction, DEFAULT_MIN_ENVELOPE_MASS_FRACTION);
    }

    /**
     * @param minCoreMassFraction smallest m/M at the top of a central zone for a convective core, in [0, 1)
     * @param surfaceSkinMassFraction largest mass fraction above a zone that still reaches the surface, in [0, 1)
     * @param minEnvelopeMassFraction smallest mass fraction of a surface zone for a convective envelope
     */
    public ConvectiveZoneFinder(double minCoreMassFraction, double surfaceSkinMassFraction,
                                double minEnvelopeMassFraction) {
        this.minEnvelopeMassFraction = ConvgridException.requireInRange("minEnvelopeMassFraction",
                minEnvelopeMassFraction, 0.0, 0.5, "");
        this.minCoreMassFraction = ConvgridException.requireInRange("minCoreMassFraction", minCoreMassFraction,
                0.0, 0.5, "");
        this.surfaceSkinMassFraction = ConvgridException.requireInRange("surfaceSkinMassFraction",
                surfaceSkinMassFraction, 0.0, 0.5, "");
    }

    /**
     * Whether a zone whose top lies at m/M = {@code outerMassFraction} reaches the surface: the mass above it is at
     * most the surface skin (the few radiative points of the atmosphere).
     */
    public static boolean reachesSurface(double outerMassFraction, double surfaceSkinMassFraction) {
        return 1.0 - outerMassFraction <= surfaceSkinMassFraction;
    }

    /**
     * Whether the outermost zone is a convective envelope: it reaches the surface ({@link #reachesSurface}) and holds
     * at least {@code minEnvelopeMassFraction} of the mass (a thinner surface zone, such as the hydrogen-ionisation
     * layer of an A star, is a zone but not an envelope). The one rule of the catalogue and the track files.
     */
    public static boolean isEnvelope(ConvectiveZone outermost, double surfaceSkinMassFraction,
                                     double minEnvelopeMassFraction) {
        return reachesSurface(outermost.outerMassFraction(), surfaceSkinMassFraction)
                && outermost.outerMassFraction() - outermost.innerMassFraction() >= minEnvelopeMassFraction;
    }

    /** The convective structure of a profile. */
    public ConvectiveStructure find(ZoneProfile profile) {
        ProfileView p = new ProfileView(profile);
        List<int[]> spans = convectiveSpans(p.excess);
        int n = p.excess.length;
        List<ConvectiveZone> zones = new ArrayList<>(spans.size());
        for (int[] span : spans) {
            int first = span[0];
            int last = span[1];
            double[] inner = first == 0 ? new double[] {0.0, 0.0} : p.crossing(first - 1);
            double[] outer = last == n - 1 ? new double[] {1.0, 1.0} : p.crossing(last);
            zones.add(new ConvectiveZone(inner[0], outer[0], inner[1], outer[1]));
        }
        if (zones.isEmpty()) {
            return new ConvectiveStructure(zones, StructureClass.RADIATIVE, 0.0, 1.0, 1.0, 0.0, Double.NaN,
                    Double.NaN);
        }
        ConvectiveZone innermost = zones.get(0);
        ConvectiveZone outermost = zones.get(zones.size() - 1);
        boolean startsAtCentre = spans.get(0)[0] == 0;
        boolean hasCore = startsAtCentre && innermost.outerMassFraction() > minCoreMassFraction;
        boolean hasEnvelope = isEnvelope(outermost, surfaceSkinMassFraction, minEnvelopeMassFraction);
        int[] envSpan = spans.get(spans.size() - 1);
        if (hasEnvelope && startsAtCentre && zones.size() == 1) {
            return new ConvectiveStructure(zones, StructureClass.FULLY_CONVECTIVE, 1.0, 0.0, 0.0,
                    profile.totalMass() * innermost.outerMassFraction(),
                    p.localTurnover(0.5 * profile.totalRadius()), p.globalTurnover(envSpan));
        }
        double core = hasCore ? innermost.outerMassFraction() : 0.0;
        if (!hasEnvelope) {
            return new ConvectiveStructure(zones, hasCore ? StructureClass.CONV_CORE : StructureClass.RADIATIVE,
                    core, 1.0, 1.0, 0.0, Double.NaN, Double.NaN);
        }
        double rBase = outermost.innerRadiusFraction() * profile.totalRadius();
        double rTop = outermost.outerRadiusFraction() * profile.totalRadius();
        // no higher than the envelope's radial midpoint: near the fully convective limit the radiative core is tiny,
        // H_P at its edge grows without bound as g -> 0 there, and half of it reached the cool outer envelope (0.325
        // Msun, Z = 0.02, 30 Myr, base at m/M 1.1e-3: 27.8 days, against 166 one step below the limit and 85 /
        // 135 / 245 at 0.327 / 0.33 / 0.35 Msun); capped, the point moves to R/2, the fully convective star's, as
        // the core vanishes, and to the midpoint of a thin envelope without the jump the old fallback made there
        double rTurn = Math.min(rBase + TURNOVER_HEIGHT_SCALE_HEIGHTS * p.scaleHeightAtCrossing(envSpan[0] - 1),
                0.5 * (rBase + rTop));
        return new ConvectiveStructure(zones,
                hasCore ? StructureClass.CONV_CORE_AND_ENVELOPE : StructureClass.CONV_ENVELOPE, core,
                outermost.innerMassFraction(), outermost.innerRadiusFraction(),
                profile.totalMass() * (outermost.outerMassFraction() - outermost.innerMassFraction()),
                p.localTurnover(rTurn), p.globalTurnover(envSpan));
    }

    /**
     * First and last mesh index of each run of points with a positive stability excess, centre outwards. A method
     * of its own, not inline in {@link #find}: its loops over every mesh point made the JIT compile the whole of
     * find, with everything after the loops inlined, on stack replacement once per loop and then once more
     * (measured on the 200-model zero-age grid: 3 optimising compilations, ~90 KB of machine code, for a method
     * called once per model). Find now loops only over the zones and stays in the quick compiler's code.
     */
    private static List<int[]> convectiveSpans(double[] excess) {
        List<int[]> spans = new ArrayList<>();
        int n = excess.length;
        int k = 0;
        while (k < n) {
            if (!(excess[k] > 0.0)) {
                k++;
                continue;
            }
            int first = k;
            while (k + 1 < n && excess[k + 1] > 0.0) {
                k++;
            }
            spans.add(new int[] {first, k});
            k++;
        }
        return spans;
    }

    /** The profile's arrays, read once, with the interpolations the finder needs. */
    private static final class ProfileView {
        private final double totalMass;
        private final double totalRadius;
        private final double alpha;
        private final double[] mass;
        private final double[] radius;
        private final double[] excess;
        private final double[] velocity;
        private final double[] scaleHeight;

        ProfileView(ZoneProfile p) {
            totalMass = p.totalMass();
            totalRadius = p.totalRadius();
            alpha = p.mixingLengthAlpha();
            mass = p.mass();
            radius = p.radius();
            excess = p.stabilityExcess();
            velocity = p.convectiveVelocity();
            scaleHeight = p.pressureScaleHeight();
        }

        /** Weight of point k + 1 where the excess interpolated between k and k + 1 vanishes. */
        private double weight(int k) {
            return excess[k] / (excess[k] - excess[k + 1]);
        }

        /** m/M and r/R where the excess changes sign between k and k + 1. */
        double[] crossing(int k) {
            double t = weight(k);
            return new double[] {lerp(mass, k, t) / totalMass, lerp(radius, k, t) / totalRadius};
        }

        /** H_P, cm, at the sign change between k and k + 1 (or at point 0 when k &lt; 0). */
        double scaleHeightAtCrossing(int k) {
            return k < 0 ? scaleHeight[0] : lerp(scaleHeight, k, weight(k));
        }

        /** alpha H_P / v_c, s, at radius r (cm), both linearly interpolated in r; NaN where v_c &lt;= 0. */
        double localTurnover(double r) {
            int k = 0;
            int hi = radius.length - 1;
            while (hi - k > 1) { // bisection for radius[k] <= r < radius[k + 1]
                int mid = (k + hi) >>> 1;
                if (radius[mid] <= r) {
                    k = mid;
                } else {
                    hi = mid;
                }
            }
            double dr = radius[k + 1] - radius[k];
            double t = dr > 0.0 ? Math.min(1.0, Math.max(0.0, (r - radius[k]) / dr)) : 0.0;
            double v = lerp(velocity, k, t);
            return v > 0.0 ? alpha * lerp(scaleHeight, k, t) / v : Double.NaN;
        }

        /**
         * Integral of dr/v_c, s, across span and the partial intervals out to its interpolated boundaries (v_c = 0
         * there), each interval exact for v_c^2 linear in r; NaN when v_c vanishes throughout.
         */
        double globalTurnover(int[] span) {
            int first = span[0];
            int last = span[1];
            double sum = 0.0;
            if (first > 0) {
                sum += intervalTime(lerp(radius, first - 1, weight(first - 1)), radius[first], 0.0, velocity[first]);
            }
            for (int k = first; k < last; k++) {
                sum += intervalTime(radius[k], radius[k + 1], velocity[k], velocity[k + 1]);
            }
            if (last < radius.length - 1) {
                sum += intervalTime(radius[last], lerp(radius, last, weight(last)), velocity[last], 0.0);
            }
            return sum > 0.0 ? sum : Double.NaN;
        }

        /**
         * 2 (r1 - r0)/(v0 + v1): the exact time across [r0, r1] when v^2 is linear in r; 0 for an empty interval
         * and for one where v_c vanishes at both ends (no flow to time, as the trapezoid rule left such intervals
         * out before).
         */
        private static double intervalTime(double r0, double r1, double v0, double v1) {
            double dr = r1 - r0;
            double v = Math.max(v0, 0.0) + Math.max(v1, 0.0);
            if (!(dr > 0.0)) {
                return 0.0;
            }
            return v > 0.0 ? 2.0 * dr / v : 0.0;
        }

        private static double lerp(double[] a, int k, double t) {
            return a[k] + t * (a[k + 1] - a[k]);
        }
    }
}
