package org.convgrid.engine.physics.nuclear;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.apache.commons.math3.ode.nonstiff.DormandPrince853Integrator;
import org.junit.jupiter.api.Test;

class AbundanceRelaxationTest {

    @Test
    void quadraticSolutionMatchesNumericalIntegration() {
        // Derived closed form (AbundanceRelaxation) against an adaptive Dormand-Prince integration of
        // dn/dt = a - c n - b n^2 (Commons Math), dimensionless units.
        double[][] cases = {{1.0, 2.0, 0.5, 0.0, 0.7}, {1.0, 2.0, 0.5, 3.0, 0.4}, {0.0, 1.0, 0.0, 2.0, 5.0},
            {2.0, 1e-3, 0.0, 0.1, 3.0}, {1.0, 1.0, 10.0, 0.0, 0.05}};
        for (double[] k : cases) {
            double a = k[0];
            double b = k[1];
            double c = k[2];
            FirstOrderDifferentialEquations ode = new FirstOrderDifferentialEquations() {
                @Override
                public int getDimension() {
                    return 1;
                }

                @Override
                public void computeDerivatives(double t, double[] y, double[] dy) {
                    dy[0] = a - c * y[0] - b * y[0] * y[0];
                }
            };
            double[] y = {k[3]};
            new DormandPrince853Integrator(1e-10, 1.0, 1e-12, 1e-12).integrate(ode, 0.0, y, k[4], y);
            assertThat(AbundanceRelaxation.quadratic(a, b, c, k[3], k[4])).isCloseTo(y[0], within(1e-9));
        }
    }

    @Test
    void quadraticReachesTheFixedPointAndKeepsTheStartWhenTimeIsShort() {
        // n+ = 2a/(c + sqrt(c^2 + 4ab)); with c = 0 this is the classical (a/b)^(1/2) (derived).
        assertThat(AbundanceRelaxation.quadratic(4.0, 1.0, 0.0, 0.0, 100.0)).isCloseTo(2.0, within(1e-12));
        assertThat(AbundanceRelaxation.quadratic(4.0, 1.0, 0.0, 0.3, 1e-12)).isCloseTo(0.3, within(1e-9));
        assertThat(AbundanceRelaxation.quadratic(0.0, 0.0, 0.0, 0.3, 1e6)).isEqualTo(0.3);
    }

    @Test
    void linearPairConservesTheSumAndRelaxesToTheRateRatio() {
        // dy12/dt = -k12 y12 + k14 y14 (lumped CN cycle, derived): steady state y12/y14 = k14/k12.
        double y12 = AbundanceRelaxation.linearPair(3.0, 1.0, 1.0, 0.0, 50.0);
        assertThat(y12).isCloseTo(0.25, within(1e-12));
        double partial = AbundanceRelaxation.linearPair(3.0, 1.0, 1.0, 0.0, 0.25);
        assertThat(partial).isCloseTo(0.25 + 0.75 * Math.exp(-1.0), within(1e-12));
        assertThat(AbundanceRelaxation.linearPair(0.0, 0.0, 0.4, 0.6, 1e9)).isEqualTo(0.4);
    }

    @Test
    void slopesMatchCentralDifferencesOfTheClosedForms() {
        // the derivatives of the closed forms along a change of their rates, against central differences of the
        // closed forms themselves (step 1e-5 relative: truncation ~1e-10, round-off ~1e-11); derived here
        double[][] cases = {{1.0, 2.0, 0.5, 0.0, 0.7}, {1.0, 2.0, 0.5, 3.0, 0.4}, {0.0, 1.0, 0.0, 2.0, 5.0},
            {2.0, 1e-3, 0.0, 0.1, 3.0}, {1.0, 1.0, 10.0, 0.0, 0.05}, {1.0, 1.0, 0.1, 0.0, 1.0e-13},
            {1.0, 1.0, 0.1, 0.0, 30.0}};
        double[][] directions = {{1.0, 0.0, 0.0}, {0.0, 1.0, 0.0}, {0.0, 0.0, 1.0}, {0.3, -0.7, 2.0}};
        double h = 1.0e-5;
        for (double[] k : cases) {
            for (double[] d : directions) {
                double da = k[0] * d[0];
                double db = k[1] * d[1];
                double dc = k[2] * d[2];
                double up = AbundanceRelaxation.quadratic(k[0] + h * da, k[1] + h * db, k[2] + h * dc, k[3], k[4]);
                double down = AbundanceRelaxation.quadratic(k[0] - h * da, k[1] - h * db, k[2] - h * dc, k[3],
                        k[4]);
                double slope = AbundanceRelaxation.quadraticSlope(k[0], k[1], k[2], k[3], k[4], da, db, dc);
                assertThat(slope).as("quadratic %s along %s", java.util.Arrays.toString(k),
                        java.util.Arrays.toString(d)).isCloseTo((up - down) / (2.0 * h),
                        within(1.0e-8 * Math.max(1.0, Math.abs(slope))));
                double k12 = k[0] + 0.1;
                double k14 = k[2] + 0.2;
                double pairUp = AbundanceRelaxation.linearPair(k12 + h * k12 * d[0], k14 + h * k14 * d[1], 0.3, 0.5,
                        k[4]);
                double pairDown = AbundanceRelaxation.linearPair(k12 - h * k12 * d[0], k14 - h * k14 * d[1], 0.3,
                        0.5, k[4]);
                assertThat(AbundanceRelaxation.linearPairSlope(k12, k14, 0.3, 0.5, k[4], k12 * d[0], k14 * d[1]))
                        .isCloseTo((pairUp - pairDown) / (2.0 * h), within(1.0e-8));
            }
        }
    }
}
