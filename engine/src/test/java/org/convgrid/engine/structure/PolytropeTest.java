package org.convgrid.engine.structure;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.convgrid.engine.units.Constants;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** The Henyey relaxation of polytropes against the Lane-Emden constants. */
class PolytropeTest {

    @ParameterizedTest
    // xi_1 and -xi_1^2 theta'(xi_1): Chandrasekhar 1939, An Introduction to the Study of Stellar Structure,
    // ch. IV, Table 4 (n = 1.5: 3.65375, 2.71406; n = 3: 6.89685, 2.01824)
    @CsvSource({"1.5, 3.65375, 2.71406", "3.0, 6.89685, 2.01824"})
    void relaxedPolytropeReproducesLaneEmdenConstants(double n, double xi1, double massConstant) {
        int points = 1000;
        double mass = Constants.M_SUN;
        double rhoC = 80.0;
        double surfaceTheta = 1.0e-6;
        PolytropicProfile profile = PolytropicProfile.of(LaneEmden.solve(n), points, 1.0e-9, surfaceTheta);
        MassMesh mesh = profile.mesh(mass);
        PolytropeEquations eq = new PolytropeEquations(mesh, n, rhoC, rhoC * Math.pow(surfaceTheta, n));
        // a deliberately wrong start: radius 15 % too large, K off by 30 %
        double omega = profile.massConstant();
        double alpha = Math.cbrt(mass / (4 * Math.PI * rhoC * omega)) * 1.15;
        double lnK = Math.log(alpha * alpha * 4 * Math.PI * Constants.G / ((n + 1) * Math.pow(rhoC, 1 / n - 1))) + 0.3;
        double[] y = new double[3 * points];
        for (int k = 0; k < points; k++) {
            y[3 * k] = Math.log(alpha * profile.xi(k));
            y[3 * k + 1] = Math.log(rhoC * Math.pow(profile.theta(k), n));
            y[3 * k + 2] = lnK;
        }
        HenyeySolver.Result result = new HenyeySolver().solve(eq, y, HenyeySolver.Settings.DEFAULT);

        assertThat(result.report().converged()).as(result.report().toString()).isTrue();
        double[] constants = eq.laneEmdenConstants(result.solution());
        assertThat(constants[0]).isCloseTo(xi1, within(1e-4 * xi1));
        assertThat(constants[1]).isCloseTo(massConstant, within(1e-4 * massConstant));
    }
}
