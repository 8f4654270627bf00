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
}
