package org.convgrid.engine.convection;

import static org.assertj.core.api.Assertions.assertThat;

import org.convgrid.engine.state.Composition;
import org.junit.jupiter.api.Test;

/** The two point rules of nabla_mu; the minmod one is also checked in the evolution's OvershootMixingTest. */
class MuGradientTest {

    private static final int POINTS = 60;
    private static final double Z = 0.02;

    private static double[] lnPressure() {
        double[] lnP = new double[POINTS];
        for (int k = 0; k < POINTS; k++) {
            // uneven spacing, as a real mesh has near a composition gradient
            lnP[k] = 40.0 - 0.1 * k - 0.04 * Math.sin(0.7 * k);
        }
        return lnP;
    }

    @Test
    void theHarmonicMeanFollowsASmoothProfileToSecondOrderWhereMinmodReadsLow() {
        double[] lnP = lnPressure();
        Composition[] smooth = new Composition[POINTS];
        for (int k = 0; k < POINTS; k++) {
            // hydrogen rising outwards as in a burnt core: X = 0.35 + 0.35 tanh((40 - ln P) / 3)
            smooth[k] = Composition.scaledSolar(0.35 + 0.35 * Math.tanh((40.0 - lnP[k]) / 3.0), Z);
        }
        double[] harmonic = MuGradient.harmonicMeanOf(smooth, lnP);
        double[] minmod = MuGradient.of(smooth, lnP);
        double harmonicWorst = 0.0;
        double minmodWorst = 0.0;
        for (int k = 5; k < POINTS - 5; k++) {
            double exact = exactSlope(lnP[k]);
            harmonicWorst = Math.max(harmonicWorst, Math.abs(harmonic[k] / exact - 1.0));
            minmodWorst = Math.max(minmodWorst, Math.abs(minmod[k] / exact - 1.0));
        }
        // the harmonic mean of the two one-sided slopes errs by the difference of the spacings, minmod by the
        // spacing itself (van Leer 1974, J. Comput. Phys. 14, 361; from memory); measured worst 0.33 % and 3.9 %
        assertThat(harmonicWorst).isLessThan(0.01);
        assertThat(minmodWorst).isGreaterThan(3.0 * harmonicWorst);
    }

    /** d ln mu / d ln P of the tanh profile above, by a fine central difference. */
    private static double exactSlope(double lnP) {
        double h = 1e-5;
        return (lnMu(lnP + h) - lnMu(lnP - h)) / (2.0 * h);
    }

    private static double lnMu(double lnP) {
        return -Math.log(MuGradient.inverseMu(Composition.scaledSolar(0.35 + 0.35 * Math.tanh((40.0 - lnP) / 3.0),
                Z)));
    }

    @Test
    void theHarmonicMeanLeavesAMixedZonesEdgeAtZeroAndStaysWithinTwiceMinmodAtAStep() {
        double[] lnP = lnPressure();
        Composition[] step = new Composition[POINTS];
        for (int k = 0; k < POINTS; k++) {
            // a mixed core (points 0-19), a hydrogen step over points 20-22, then a homogeneous envelope
            double x = k < 20 ? 0.25 : k < 23 ? 0.25 + 0.45 * (k - 19) / 4.0 : 0.7;
            step[k] = Composition.scaledSolar(x, Z);
        }
        double[] harmonic = MuGradient.harmonicMeanOf(step, lnP);
        double[] minmod = MuGradient.of(step, lnP);
        assertThat(harmonic[19]).as("the core's edge point").isZero();
        assertThat(harmonic[23]).as("the envelope's edge point").isZero();
        for (int k = 0; k < POINTS; k++) {
            assertThat(harmonic[k]).as("point %d", k).isGreaterThanOrEqualTo(0.0)
                    .isBetween(minmod[k], 2.0 * minmod[k]);
        }
        assertThat(harmonic[21]).isPositive();
    }
}
