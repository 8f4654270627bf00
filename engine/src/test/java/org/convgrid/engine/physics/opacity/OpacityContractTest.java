package org.convgrid.engine.physics.opacity;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.ArrayList;
import java.util.List;
import org.convgrid.engine.state.Composition;
import org.junit.jupiter.api.Test;

/**
 * Contract every {@link Opacity} must meet: finite positive kappa, and analytic log-derivatives that agree with
 * centred finite differences (a property of the implementation, no published source needed).
 */
abstract class OpacityContractTest {

    /** Step in ln rho and ln T for the centred differences. */
    static final double LOG_STEP = 1.0e-4;
    /** Allowed |analytic - numerical| of a log-derivative (plus DERIVATIVE_REL times its size). */
    static final double DERIVATIVE_ABS = 2.0e-4;
    static final double DERIVATIVE_REL = 1.0e-4;

    abstract Opacity opacity();

    /** Absolute tolerance on log-derivatives; C1 interpolants override it (curvature jumps at nodes). */
    double derivativeTolerance() {
        return DERIVATIVE_ABS;
    }

    /** Sample points {rho, T, X, Z}; default: log T 3.5..8, log R -7..1, two compositions. */
    List<double[]> points() {
        List<double[]> p = new ArrayList<>();
        for (double logT = 3.5; logT <= 8.0; logT += 0.3) {
            for (double logR = -7.0; logR <= 1.0; logR += 1.0) {
                double rho = Math.pow(10.0, logR + 3.0 * (logT - 6.0));
                p.add(new double[] {rho, Math.pow(10.0, logT), 0.70, 0.02});
                p.add(new double[] {rho, Math.pow(10.0, logT), 0.35, 0.001});
            }
        }
        return p;
    }

    @Test
    void kappaIsFiniteAndPositive() {
        for (double[] q : points()) {
            double k = opacity().rosselandMean(q[0], q[1], Composition.scaledSolar(q[2], q[3])).kappa();
            assertThat(k).as("kappa at rho %s T %s", q[0], q[1]).isPositive().isFinite();
        }
    }

    @Test
    void logDerivativesMatchFiniteDifferences() {
        Opacity o = opacity();
        for (double[] q : points()) {
            Composition c = Composition.scaledSolar(q[2], q[3]);
            double rho = q[0];
            double t = q[1];
            OpacityValue v = o.rosselandMean(rho, t, c);
            double e = Math.exp(LOG_STEP);
            double numRho = (Math.log(o.rosselandMean(rho * e, t, c).kappa())
                    - Math.log(o.rosselandMean(rho / e, t, c).kappa())) / (2 * LOG_STEP);
            double numT = (Math.log(o.rosselandMean(rho, t * e, c).kappa())
                    - Math.log(o.rosselandMean(rho, t / e, c).kappa())) / (2 * LOG_STEP);
            assertThat(v.dlnKappaDlnRho()).as("dlnk/dlnrho at rho %s T %s", rho, t)
                    .isCloseTo(numRho, within(derivativeTolerance() + DERIVATIVE_REL * Math.abs(numRho)));
            assertThat(v.dlnKappaDlnT()).as("dlnk/dlnT at rho %s T %s", rho, t)
                    .isCloseTo(numT, within(derivativeTolerance() + DERIVATIVE_REL * Math.abs(numT)));
        }
    }
}
