package org.convgrid.engine.structure;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

/**
 * The quadrature of {@link AcousticTravelTime} on sound-speed profiles whose travel times are known in closed form
 * (the definitions T = integral of dr / c from 0 to R, tau(r) = integral of dr / c from r to R; no published source
 * needed beyond them).
 */
class AcousticTravelTimeTest {

    private static double[] evenRadii(double innermost, double surface, int points) {
        double[] r = new double[points];
        for (int k = 0; k < points; k++) {
            r[k] = innermost + (surface - innermost) * k / (points - 1);
        }
        return r;
    }

    @Test
    void aUniformSoundSpeedTakesRadiusOverSpeed() {
        double[] r = evenRadii(1e6, 7e10, 40);
        double[] c = new double[r.length];
        java.util.Arrays.fill(c, 2e7);
        assertThat(AcousticTravelTime.acousticRadius(r, c)).isCloseTo(7e10 / 2e7, within(1e-9));
        assertThat(AcousticTravelTime.depthAt(r, c, 0.7 * 7e10)).isCloseTo(0.3 * 7e10 / 2e7, within(1e-9));
        assertThat(AcousticTravelTime.depthAt(r, c, 7e10)).isZero();
        // from the centre: the segment below the innermost point counts at that point's speed
        assertThat(AcousticTravelTime.depthAt(r, c, 0.0)).isCloseTo(7e10 / 2e7, within(1e-9));
    }

    @Test
    void aSlownessLinearInRadiusIsIntegratedExactlyBetweenPoints() {
        // 1 / c = a + b r: the trapezoid is exact, T = a R + b R^2 / 2 minus nothing below the innermost point when
        // that point is near the centre; check the depth of a radius between two points, which is interpolated
        double a = 1e-8;
        double b = 1e-18;
        double[] r = evenRadii(1e3, 7e10, 71);
        double[] c = new double[r.length];
        for (int k = 0; k < r.length; k++) {
            c[k] = 1.0 / (a + b * r[k]);
        }
        double surface = 7e10;
        double inner = 0.4321 * surface;
        double exact = a * (surface - inner) + 0.5 * b * (surface * surface - inner * inner);
        assertThat(AcousticTravelTime.depthAt(r, c, inner)).isCloseTo(exact, within(1e-9 * exact));
        double exactRadius = a * surface + 0.5 * b * surface * surface;
        // below the innermost point (1e3 cm) the speed is held: an error of order b r_0^2, far below 1e-9 T
        assertThat(AcousticTravelTime.acousticRadius(r, c)).isCloseTo(exactRadius, within(1e-9 * exactRadius));
    }

    /** Radii crowding towards the surface like a star's mesh: x = 1 - (1 - k / (n - 1))^3, from x0 up to 1. */
    private static double[] surfaceCrowdedRadii(double surface, int points) {
        double[] r = new double[points];
        for (int k = 0; k < points; k++) {
            double u = 1.0 - (double) k / (points - 1);
            r[k] = surface * (1e-3 + (1.0 - 1e-3) * (1.0 - u * u * u));
        }
        return r;
    }

    /** 1 / c = a + b / (1 - x + e), x = r / R: slow near the surface as in a star, and integrable in closed form. */
    private static double[] steepSoundSpeeds(double[] r, double surface) {
        double[] c = new double[r.length];
        for (int k = 0; k < r.length; k++) {
            c[k] = 1.0 / (2e-8 + 1e-9 / (1.0 - r[k] / surface + 1e-3));
        }
        return c;
    }

    /** The closed form of the integral of that 1 / c from r1 to r2, s. */
    private static double steepTravelTime(double r1, double r2, double surface) {
        return 2e-8 * (r2 - r1) + 1e-9 * surface
                * Math.log((1.0 - r1 / surface + 1e-3) / (1.0 - r2 / surface + 1e-3));
    }

    @Test
    void aSpeedFallingSteeplyToTheSurfaceIsIntegratedToATenthOfAPerCentAndDepthsAdd() {
        double surface = 7e10;
        double[] r = surfaceCrowdedRadii(surface, 500);
        double[] c = steepSoundSpeeds(r, surface);
        double total = AcousticTravelTime.acousticRadius(r, c);
        // the part below the innermost point (r0 = 1e-3 R) at that point's speed, the rest in closed form
        double exact = r[0] * (2e-8 + 1e-9 / (1.0 - r[0] / surface + 1e-3)) + steepTravelTime(r[0], surface, surface);
        assertThat(total).isCloseTo(exact, within(1e-3 * exact));
        double base = 0.713 * surface;
        assertThat(AcousticTravelTime.depthAt(r, c, base))
                .isCloseTo(steepTravelTime(base, surface, surface), within(1e-3 * exact));
        // half the points: the error grows about fourfold (second order), still small
        double[] half = surfaceCrowdedRadii(surface, 250);
        double coarse = AcousticTravelTime.acousticRadius(half, steepSoundSpeeds(half, surface));
        assertThat(Math.abs(coarse - exact)).isGreaterThan(2.0 * Math.abs(total - exact))
                .isLessThan(5e-3 * exact);
        // depths add: from 0.5 R up equals from 0.5 R to 0.9 R plus from 0.9 R up
        double deep = AcousticTravelTime.depthAt(r, c, 0.5 * surface);
        double shallow = AcousticTravelTime.depthAt(r, c, 0.9 * surface);
        assertThat(deep - shallow).isCloseTo(steepTravelTime(0.5 * surface, 0.9 * surface, surface),
                within(1e-3 * exact));
    }

    @Test
    void refusesWhatItCannotIntegrate() {
        double[] r = {1e6, 2e6, 3e6};
        assertThatThrownBy(() -> AcousticTravelTime.acousticRadius(r, new double[] {1.0, 0.0, 1.0}))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("above 0");
        assertThatThrownBy(() -> AcousticTravelTime.acousticRadius(new double[] {1e6, 1e6, 3e6},
                new double[] {1.0, 1.0, 1.0})).isInstanceOf(IllegalArgumentException.class)
                .hasMessageContaining("increase");
        assertThatThrownBy(() -> AcousticTravelTime.depthAt(r, new double[] {1.0, 1.0, 1.0}, 4e6))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("between the centre");
        assertThatThrownBy(() -> AcousticTravelTime.acousticRadius(r, new double[] {1.0, 1.0}))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("as many");
    }
}
