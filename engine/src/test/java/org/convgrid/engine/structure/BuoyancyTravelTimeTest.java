package org.convgrid.engine.structure;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

/**
 * The quadrature of {@link BuoyancyTravelTime} on synthetic profiles whose integral of N dr / r is known in closed
 * form: checks of the arithmetic, no physics source needed. The definitions Pi_0 = 2 pi^2 / integral and
 * Delta Pi_l = Pi_0 / sqrt(l (l + 1)) are Tassoul's (1980, ApJS 43, 469) as given by Aerts, Christensen-Dalsgaard &amp;
 * Kurtz 2010, "Asteroseismology", ch. 3 (equation numbers from memory). Solved models:
 * BuoyancyTravelTimeOfSolvedStarsTest.
 */
class BuoyancyTravelTimeTest {

    private static final double SLOPE = 3.0e-14;   // N = SLOPE r, s^-1 cm^-1: N / r constant
    private static final double OUTER = 1.0e11;    // cm

    private static double[] uniformRadii(double inner, double outer, int points) {
        double[] r = new double[points];
        for (int k = 0; k < points; k++) {
            r[k] = inner + (outer - inner) * k / (points - 1);
        }
        return r;
    }

    @Test
    void aFrequencyProportionalToRadiusIntegratesExactlyFromTheCentre() {
        // N = c r everywhere: integral of N / r from 0 to R = c R; the trapezoid of a constant is exact and the
        // centre's segment (N / r taken constant below the innermost point) is too
        double[] r = uniformRadii(2.0e8, OUTER, 37);
        double[] n2 = new double[r.length];
        for (int k = 0; k < r.length; k++) {
            n2[k] = SLOPE * SLOPE * r[k] * r[k];
        }
        assertThat(BuoyancyTravelTime.cavityIntegral(r, n2)).isCloseTo(SLOPE * OUTER, within(1e-12 * SLOPE * OUTER));
        assertThat(BuoyancyTravelTime.of(r, n2)).isCloseTo(2.0 * Math.PI * Math.PI / (SLOPE * OUTER),
                within(1e-9));
    }

    @Test
    void aSmoothIntegrandConvergesAtSecondOrderToItsClosedForm() {
        // N / r = c exp(-r / L): integral from 0 to R = c L (1 - exp(-R / L)); the trapezoid's error falls as h^2,
        // so it quarters when the points double
        double scale = 0.3 * OUTER;
        double exact = SLOPE * scale * (1.0 - Math.exp(-OUTER / scale));
        double[] errors = new double[3];
        int[] intervals = {100, 200, 400};
        for (int i = 0; i < intervals.length; i++) {
            // the innermost point at a tenth of an interval, as our meshes' innermost point sits near the centre
            double h = OUTER / intervals[i];
            double[] r = uniformRadii(0.1 * h, OUTER, intervals[i] + 1);
            double[] n2 = new double[r.length];
            for (int k = 0; k < r.length; k++) {
                double n = SLOPE * r[k] * Math.exp(-r[k] / scale);
                n2[k] = n * n;
            }
            errors[i] = BuoyancyTravelTime.cavityIntegral(r, n2) - exact;
        }
        assertThat(Math.abs(errors[0]) / exact).isLessThan(1e-4);
        assertThat(errors[0] / errors[1]).isCloseTo(4.0, within(0.2));
        assertThat(errors[1] / errors[2]).isCloseTo(4.0, within(0.2));
    }

    @Test
    void theIntervalAcrossAConvectiveCoresEdgeCountsHalfItsOuterEnd() {
        // N^2 slightly negative (superadiabatic) below r_c = 0.0735 R, N = c r above: the cavity's integral is
        // c (R - r_c); the points straddling r_c lie at 0.07 R and 0.08 R, and the clamped trapezoid gives that
        // interval (0 + c) / 2 times its width: c (R - 0.08 R) + c 0.01 R / 2 = c 0.925 R
        double[] r = uniformRadii(0.01 * OUTER, OUTER, 100);
        double[] n2 = new double[r.length];
        for (int k = 0; k < r.length; k++) {
            n2[k] = r[k] < 0.0735 * OUTER ? -1.0e-9 : SLOPE * SLOPE * r[k] * r[k];
        }
        double halfIntervalRule = SLOPE * 0.925 * OUTER;
        assertThat(BuoyancyTravelTime.cavityIntegral(r, n2)).isCloseTo(halfIntervalRule,
                within(1e-12 * halfIntervalRule));
        // within half an interval's N / r of the true cavity integral
        assertThat(BuoyancyTravelTime.cavityIntegral(r, n2)).isCloseTo(SLOPE * (1.0 - 0.0735) * OUTER,
                within(0.5 * SLOPE * 0.01 * OUTER));
    }

    @Test
    void noStablePointGivesNaNAndAPointAtTheCentreIsRefused() {
        double[] r = uniformRadii(1.0e8, OUTER, 10);
        double[] convective = new double[r.length];
        java.util.Arrays.fill(convective, -1.0e-12);
        assertThat(BuoyancyTravelTime.of(r, convective)).isNaN();
        double[] fromCentre = uniformRadii(0.0, OUTER, 10);
        assertThatThrownBy(() -> BuoyancyTravelTime.cavityIntegral(fromCentre, new double[10]))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("r = 0");
        assertThatThrownBy(() -> BuoyancyTravelTime.cavityIntegral(new double[] {2.0, 1.0}, new double[2]))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("increase");
    }

    @Test
    void theSpacingOfDegreeLDividesByTheSquareRootOfLTimesLPlusOne() {
        assertThat(BuoyancyTravelTime.periodSpacing(4195.0, 1)).isCloseTo(4195.0 / Math.sqrt(2.0), within(1e-9));
        assertThat(BuoyancyTravelTime.periodSpacing(4195.0, 2)).isCloseTo(4195.0 / Math.sqrt(6.0), within(1e-9));
        assertThatThrownBy(() -> BuoyancyTravelTime.periodSpacing(4195.0, 0))
                .isInstanceOf(IllegalArgumentException.class);
    }
}
