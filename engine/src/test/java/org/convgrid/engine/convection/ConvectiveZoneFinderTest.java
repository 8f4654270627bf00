package org.convgrid.engine.convection;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.function.DoubleUnaryOperator;

import org.convgrid.engine.error.ConvgridException;
import org.convgrid.engine.error.ErrorKind;
import org.junit.jupiter.api.Test;

/**
 * Synthetic profiles with r/R = m/M so that linear stability excesses put the boundaries exactly where the
 * linear interpolation the README ("Definitions the catalogue uses") describes; the expected numbers are derived by hand for each profile.
 */
class ConvectiveZoneFinderTest {

    private static final double M = 2.0e33;
    private static final double R = 7.0e10;
    private static final double ALPHA = 1.8;
    private final ConvectiveZoneFinder finder = new ConvectiveZoneFinder();

    /** Uniform mesh in q = m/M with r = q R, excess(q), v(q) and H_P(q). */
    private static ZoneProfile profile(double[] q, DoubleUnaryOperator excess, DoubleUnaryOperator v,
                                       DoubleUnaryOperator hp) {
        int n = q.length;
        double[] m = new double[n];
        double[] r = new double[n];
        double[] e = new double[n];
        double[] vc = new double[n];
        double[] h = new double[n];
        for (int k = 0; k < n; k++) {
            m[k] = q[k] * M;
            r[k] = q[k] * R;
            e[k] = excess.applyAsDouble(q[k]);
            vc[k] = e[k] > 0 ? v.applyAsDouble(q[k]) : 0.0;
            h[k] = hp.applyAsDouble(q[k]);
        }
        return new ZoneProfile(M, R, m, r, e, vc, h, ALPHA);
    }

    private static double[] uniform(int n) {
        double[] q = new double[n];
        for (int k = 0; k < n; k++) {
            q[k] = (double) k / (n - 1);
        }
        return q;
    }

    private static ZoneProfile simple(DoubleUnaryOperator excess) {
        return profile(uniform(1001), excess, q -> 1e4, q -> 0.05 * R);
    }

    @Test
    void aThinSurfaceIonisationZoneIsListedButIsNoEnvelope() {
        // A hot star: convective core to m/M = 0.2 and a surface zone holding 1e-7 of the mass (A-star-like
        // ionisation zone; DEFAULT_MIN_ENVELOPE_MASS_FRACTION = 1e-6).
        double[] q = new double[2001];
        for (int k = 0; k < 1001; k++) {
            q[k] = 0.999 * k / 1000.0;
        }
        for (int k = 1; k <= 1000; k++) {
            q[1000 + k] = 1.0 - 1.0e-3 * Math.pow(10.0, -9.0 * k / 1000.0); // down to 1e-12 below the surface
        }
        q[2000] = 1.0;
        ConvectiveStructure s = finder.find(profile(q, x -> x < 0.2 ? 0.1 : (1 - x < 1e-7 ? 0.1 : -0.1),
                x -> 1e4, x -> 0.05 * R));
        assertThat(s.zones()).hasSize(2);
        assertThat(s.structureClass()).isEqualTo(StructureClass.CONV_CORE);
        assertThat(s.envelopeBaseMassFraction()).isEqualTo(1.0);
        ConvectiveStructure permissive = new ConvectiveZoneFinder(1e-4, 1e-6, 1e-8)
                .find(profile(q, x -> x < 0.2 ? 0.1 : (1 - x < 1e-7 ? 0.1 : -0.1), x -> 1e4, x -> 0.05 * R));
        assertThat(permissive.structureClass()).isEqualTo(StructureClass.CONV_CORE_AND_ENVELOPE);
    }

    @Test
    void radiativeStarHasNoZones() {
        ConvectiveStructure s = finder.find(simple(q -> -0.1));
        assertThat(s.structureClass()).isEqualTo(StructureClass.RADIATIVE);
        assertThat(s.zones()).isEmpty();
        assertThat(new double[] {s.coreMassFraction(), s.envelopeBaseMassFraction(),
                s.envelopeBaseRadiusFraction(), s.envelopeMass()}).containsExactly(0.0, 1.0, 1.0, 0.0);
        assertThat(s.turnoverTimeLocal()).isNaN();
        assertThat(s.turnoverTimeGlobal()).isNaN();
    }

    @Test
    void convectiveCoreTopIsInterpolatedExactly() {
        ConvectiveStructure s = finder.find(simple(q -> 0.12345 - q));
        assertThat(s.structureClass()).isEqualTo(StructureClass.CONV_CORE);
        assertThat(s.coreMassFraction()).isCloseTo(0.12345, within(1e-13));
        assertThat(s.zones()).singleElement().satisfies(z -> {
            assertThat(z.innerMassFraction()).isZero();
            assertThat(z.outerRadiusFraction()).isCloseTo(0.12345, within(1e-13));
        });
        assertThat(s.envelopeBaseMassFraction()).isEqualTo(1.0);
        assertThat(s.turnoverTimeLocal()).isNaN();
    }

    @Test
    void convectiveEnvelopeBaseIsInterpolatedExactly() {
        // A non-linear but sign-preserving excess scale does not move the boundary: only its zero matters.
        ConvectiveStructure s = finder.find(simple(q -> 3.0 * (q - 0.71234)));
        assertThat(s.structureClass()).isEqualTo(StructureClass.CONV_ENVELOPE);
        assertThat(s.coreMassFraction()).isZero();
        assertThat(s.envelopeBaseMassFraction()).isCloseTo(0.71234, within(1e-13));
        assertThat(s.envelopeBaseRadiusFraction()).isCloseTo(0.71234, within(1e-13));
        assertThat(s.envelopeMass()).isCloseTo(M * (1 - 0.71234), within(1e-12 * M));
        assertThat(s.zones()).singleElement().satisfies(z -> assertThat(z.outerMassFraction()).isEqualTo(1.0));
    }

    @Test
    void coreAndEnvelope() {
        ConvectiveStructure s = finder.find(simple(q -> q < 0.5 ? 0.0812 - q : q - 0.9907));
        assertThat(s.structureClass()).isEqualTo(StructureClass.CONV_CORE_AND_ENVELOPE);
        assertThat(s.zones()).hasSize(2);
        assertThat(s.coreMassFraction()).isCloseTo(0.0812, within(1e-13));
        assertThat(s.envelopeBaseMassFraction()).isCloseTo(0.9907, within(1e-13));
    }

    @Test
    void fullyConvectiveStarReportsCoreOneAndBaseZero() {
        // ConvectiveStructure: a fully convective star has core fraction 1 and envelope base 0 (the catalogue then
        // writes an empty core and an envelope from the centre, README "Catalogue").
        ConvectiveStructure s = finder.find(simple(q -> 0.5));
        assertThat(s.structureClass()).isEqualTo(StructureClass.FULLY_CONVECTIVE);
        assertThat(new double[] {s.coreMassFraction(), s.envelopeBaseMassFraction(),
                s.envelopeBaseRadiusFraction(), s.envelopeMass()}).containsExactly(1.0, 0.0, 0.0, M);
        // Local turnover at R/2: alpha H_P / v = 1.8 * 0.05 R / 1e4 cm/s.
        assertThat(s.turnoverTimeLocal()).isCloseTo(ALPHA * 0.05 * R / 1e4, within(1e-6));
        // Global: R / v over the whole star (v constant, every point convective).
        assertThat(s.turnoverTimeGlobal()).isCloseTo(R / 1e4, within(1e-3));
    }

    @Test
    void radiativeSkinBelowTheSurfaceThresholdStillReachesTheSurface() {
        double[] q = withSurfacePoints(uniform(1001), 1 - 1e-7, 1 - 1e-8);
        ConvectiveStructure fully = finder.find(profile(q, x -> x < 1 - 5e-8 ? 1.0 : -1.0, x -> 1e4, x -> 1e9));
        assertThat(fully.structureClass()).isEqualTo(StructureClass.FULLY_CONVECTIVE);
        ConvectiveStructure env = finder.find(profile(q, x -> x > 0.7 && x < 1 - 5e-8 ? 1.0 : -1.0, x -> 1e4,
                x -> 1e9));
        assertThat(env.structureClass()).isEqualTo(StructureClass.CONV_ENVELOPE);
        // A skin thicker than the threshold: the zone is a subsurface zone, not an envelope.
        ConvectiveStructure sub = finder.find(simple(x -> x > 0.7 && x < 0.99 ? 1.0 : -1.0));
        assertThat(sub.structureClass()).isEqualTo(StructureClass.RADIATIVE);
        assertThat(sub.zones()).hasSize(1);
    }

    @Test
    void thinRadiativeShellSeparatesCoreFromEnvelope() {
        ConvectiveStructure s = finder.find(simple(x -> Math.abs(x - 0.4) < 0.0015 ? -1.0 : 1.0));
        assertThat(s.structureClass()).isEqualTo(StructureClass.CONV_CORE_AND_ENVELOPE);
        assertThat(s.coreMassFraction()).isCloseTo(0.3985, within(1e-3));
        assertThat(s.envelopeBaseMassFraction()).isCloseTo(0.4015, within(1e-3));
    }

    @Test
    void tinyCentralZoneIsListedButIsNotACore() {
        double[] q = new double[1101];
        for (int k = 1; k <= 100; k++) {
            q[k] = 1e-6 * Math.pow(1e4, (k - 1) / 99.0); // 1e-6 ... 1e-2 geometric near the centre
        }
        for (int k = 101; k < q.length; k++) {
            q[k] = 1e-2 + (1 - 1e-2) * (k - 100) / 1000.0;
        }
        DoubleUnaryOperator excess = x -> 5e-5 - x; // central zone up to m/M = 5e-5 < 1e-4
        ConvectiveStructure s = finder.find(profile(q, excess, x -> 1e4, x -> 1e9));
        assertThat(s.structureClass()).isEqualTo(StructureClass.RADIATIVE);
        assertThat(s.coreMassFraction()).isZero();
        assertThat(s.zones()).singleElement()
                .satisfies(z -> assertThat(z.outerMassFraction()).isCloseTo(5e-5, within(1e-15)));
        ConvectiveStructure lowThreshold = new ConvectiveZoneFinder(1e-5, 1e-6)
                .find(profile(q, excess, x -> 1e4, x -> 1e9));
        assertThat(lowThreshold.structureClass()).isEqualTo(StructureClass.CONV_CORE);
        assertThat(lowThreshold.coreMassFraction()).isCloseTo(5e-5, within(1e-15));
    }

    @Test
    void turnoverTimesOnAnAnalyticEnvelope() {
        // Derived: base q_b = 0.7123 (r = q R), v = v0 (1 + 2 (r - r_b)/R), H_P = H0 (1 - (r - r_b)/(2R)), all
        // linear in r so the interpolation is exact. Local: r* = r_b + H0/2 (half a pressure scale height,
        // README "Catalogue"), tau = alpha H_P(r*)/v(r*).
        // Global: int dr/v from the first mesh point above the base to R = (R/2v0) ln(v(R)/v(r_1)), plus the
        // partial interval from the base to that point, timed as if v fell to 0 at the base: 2 (r_1 - r_b)/v(r_1).
        double qb = 0.7123;
        double v0 = 3e4;
        double h0 = 0.02 * R;
        double[] q = uniform(2001);
        ZoneProfile p = profile(q, x -> x - qb, x -> v0 * (1 + 2 * (x - qb)), x -> h0 * (1 - (x - qb) / 2));
        ConvectiveStructure s = finder.find(p);
        double rb = qb * R;
        double rStar = rb + h0 / 2;
        double dr = (rStar - rb) / R;
        double local = ALPHA * h0 * (1 - dr / 2) / (v0 * (1 + 2 * dr));
        assertThat(s.turnoverTimeLocal()).isCloseTo(local, within(1e-10 * local));
        double q1 = 0.7125; // first mesh point above the base (step 5e-4)
        double global = R / (2 * v0) * Math.log((1 + 2 * (1 - qb)) / (1 + 2 * (q1 - qb)))
                + 2 * (q1 - qb) * R / (v0 * (1 + 2 * (q1 - qb)));
        assertThat(s.turnoverTimeGlobal()).isCloseTo(global, within(1e-6 * global));
    }

    @Test
    void globalTurnoverIsExactForMixingLengthVelocitiesVanishingAtTheBase() {
        // Mixing-length theory: v_c^2 proportional to the superadiabatic excess (Boehm-Vitense 1958), which vanishes
        // linearly at the envelope base, so v = v0 sqrt((x - q_b)/(1 - q_b)) with x = r/R and
        // int_{r_b}^{R} dr/v = 2 R (1 - q_b)/v0 exactly. The answer must not hinge on how close the first mesh
        // point lies to the base: bases 0.3 of a mesh step and 1e-9 R below a point give the same time.
        double v0 = 3e4;
        double[] q = uniform(2001); // step 5e-4
        for (double qb : new double[] {0.71235 - 0.3 * 5e-4, 0.7125 - 1e-9, 0.71234}) {
            ZoneProfile p = profile(q, x -> x - qb, x -> x > qb ? v0 * Math.sqrt((x - qb) / (1 - qb)) : 0.0,
                    x -> 0.02 * R);
            double exact = 2 * R * (1 - qb) / v0;
            assertThat(finder.find(p).turnoverTimeGlobal()).as("base at %s", qb)
                    .isCloseTo(exact, within(1e-9 * exact));
        }
    }

    @Test
    void veryThinEnvelopeUsesItsMidpoint() {
        // Half a scale height (0.05 R) overshoots the 0.001 R deep envelope: evaluated at its middle.
        ConvectiveStructure s = finder.find(profile(uniform(100001), x -> x - 0.999, x -> 2e5 * x, x -> 0.1 * R));
        double mid = 0.9995;
        assertThat(s.turnoverTimeLocal()).isCloseTo(ALPHA * 0.1 * R / (2e5 * mid), within(1e-9));
    }

    @Test
    void aTinyRadiativeCoreGivesTheTurnoverTimeOfTheFullyConvectiveStar() {
        // Near the fully convective limit: H_P at the edge of a radiative core a few 1e-3 R across is of the order
        // of the star (1.5 R here). Half of it above the base would land in the outer envelope (at 0.75 R); the
        // point is capped at the envelope's radial midpoint, which tends to the fully convective star's R/2 as the
        // core vanishes, so the time is continuous across the limit (catalogue definition, README "Catalogue"; v_c
        // rises outwards here, so a point too far out gives too short a time, as in the stars that showed it)
        DoubleUnaryOperator v = x -> 1e4 * (1 + 9 * x);
        DoubleUnaryOperator hp = x -> 1.5 * R * (1 - x / 2);
        double fullyConvective = finder.find(profile(uniform(2001), x -> 0.1, v, hp)).turnoverTimeLocal();
        double previous = Double.NaN;
        for (double qb : new double[] {0.0102, 0.0052, 0.0022}) {
            ConvectiveStructure s = finder.find(profile(uniform(2001), x -> x - qb, v, hp));
            assertThat(s.structureClass()).isEqualTo(StructureClass.CONV_ENVELOPE);
            double mid = 0.5 * (qb + 1.0);
            double expected = ALPHA * hp.applyAsDouble(mid) / v.applyAsDouble(mid);
            assertThat(s.turnoverTimeLocal()).as("base at %s", qb).isCloseTo(expected, within(1e-9 * expected));
            previous = s.turnoverTimeLocal();
        }
        assertThat(previous).isCloseTo(fullyConvective, within(0.01 * fullyConvective));
    }

    @Test
    void profileValidation() {
        double[] two = {0, 1};
        assertThatThrownBy(() -> new ZoneProfile(M, R, two, new double[] {0, 1, 2}, two, two, two, ALPHA))
                .isInstanceOf(ConvgridException.class)
                .satisfies(e -> assertThat(((ConvgridException) e).kind()).isEqualTo(ErrorKind.BAD_DATA));
        assertThatThrownBy(() -> new ZoneProfile(M, R, new double[] {1, 0}, two, two, two, two, ALPHA))
                .isInstanceOf(ConvgridException.class);
    }

    private static double[] withSurfacePoints(double[] q, double... extra) {
        double[] out = new double[q.length + extra.length];
        System.arraycopy(q, 0, out, 0, q.length - 1);
        System.arraycopy(extra, 0, out, q.length - 1, extra.length);
        out[out.length - 1] = 1.0;
        return out;
    }
}
