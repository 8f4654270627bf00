package org.convgrid.engine.zams;

import static org.assertj.core.api.Assertions.assertThat;

import org.convgrid.engine.physics.nuclear.NuclearNetwork;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.structure.ModelState;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * The analytic slopes of eps along the local 3He and CN equilibrium ({@link NuclearNetwork#equilibriumEnergy}, used
 * by the structure equations of zero-age models) against the differenced form they replaced, at every burning point
 * of converged zero-age models. The oracle is the central difference of burn(equilibrium(...)) over a relative step
 * of 1e-4 in ln rho and ln T (truncation ~1e-8 relative, round-off ~1e-12), compared where eps exceeds 1e-6 of its
 * central value. Derived here, no published source: the chain rule through the closed forms of the abundances.
 */
class EquilibriumBurningSlopesTest {

    private static final double STEP = 1.0e-4;

    @ParameterizedTest
    @ValueSource(doubles = {0.8, 1.0, 1.5})
    void analyticSlopesMatchTheDifferencedOnes(double massInSun) {
        Composition initial = ZamsFixtures.PROTOSOLAR;
        ModelState state = ZamsFixtures.model(initial, massInSun).model().state();
        NuclearNetwork network = ZamsFixtures.physics(initial).nuclear();
        double[] analytic = new double[3];
        double centralEps = network.equilibriumEnergy(Math.exp(state.lnDensity(0)), Math.exp(state.lnTemperature(0)),
                initial, analytic) == null ? Double.NaN : analytic[0];
        double worst = 0.0;
        int compared = 0;
        for (int k = 0; k < state.mesh().size(); k++) {
            double rho = Math.exp(state.lnDensity(k));
            double t = Math.exp(state.lnTemperature(k));
            Composition c = network.equilibriumEnergy(rho, t, initial, analytic);
            assertThat(c).isEqualTo(network.equilibrium(rho, t, initial));
            double eps = network.burn(rho, t, c).eps();
            if (analytic[0] == 0.0 || eps < 1.0e-6 * centralEps) {
                continue;
            }
            assertThat(analytic[0]).isEqualTo(eps);
            double byRho = (eps(network, rho * Math.exp(STEP), t, initial) - eps(network, rho * Math.exp(-STEP), t,
                    initial)) / (2.0 * STEP * eps);
            double byT = (eps(network, rho, t * Math.exp(STEP), initial) - eps(network, rho, t * Math.exp(-STEP),
                    initial)) / (2.0 * STEP * eps);
            worst = Math.max(worst, Math.abs(analytic[1] - byRho) / Math.max(1.0, Math.abs(byRho)));
            worst = Math.max(worst, Math.abs(analytic[2] - byT) / Math.max(1.0, Math.abs(byT)));
            compared++;
        }
        assertThat(compared).isGreaterThan(50);
        // measured 3.9-4.2e-7 at 0.8, 1 and 1.5 Msun, the size of the network's own slopes at fixed composition
        // against the same differences; the one-sided differences over 1e-6 they replace err by ~5e-6
        assertThat(worst).isLessThan(1.0e-5);
    }

    private static double eps(NuclearNetwork network, double rho, double t, Composition initial) {
        return network.burn(rho, t, network.equilibrium(rho, t, initial)).eps();
    }
}
