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

    @Test
    void depthsAddUpToTheAcousticRadius() {
        double[] r = evenRadii(5e7, 7e10, 300);
        double[] c = new double[r.length];
        for (int k = 0; k < r.length; k++) {
            // a speed falling steeply to the surface, as in a star (c ~ 5e7 cm/s at the centre, ~1e6 at the top)
            c[k] = 5e7 * Math.pow(1.0 - 0.98 * r[k] / 7e10, 1.5) + 1e5;
        }
        double total = AcousticTravelTime.acousticRadius(r, c);
        double deep = AcousticTravelTime.depthAt(r, c, 0.5 * 7e10);
        double shallow = AcousticTravelTime.depthAt(r, c, 0.9 * 7e10);
        assertThat(deep).isGreaterThan(shallow).isLessThan(total);
        assertThat(AcousticTravelTime.depthAt(r, c, r[0])).isCloseTo(total - r[0] / c[0], within(1e-9 * total));
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
