package org.convgrid.engine.evolution;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.Test;

class BurgersFlowTest {

    private static final double T = 2.2e6;
    private static final double KT = Constants.K_B * T;
    /** Hydrogen, helium, electrons, oxygen at the density of the solar envelope base (0.19 g cm^-3). */
    private static final double[] A = {1.0, 4.0, GravitationalSettling.ELECTRON_MASS_NUMBER, 16.0};
    private static final double[] CHARGE = {1.0, 2.0, -1.0, 8.0};

    private static BurgersFlow flow(double[] n) {
        double[][] k = new double[4][4];
        double[] mass = new double[4];
        for (int s = 0; s < 4; s++) {
            mass[s] = A[s] * Constants.M_U;
            for (int t = 0; t < 4; t++) {
                k[s][t] = GravitationalSettling.resistance(A[s], Math.abs(CHARGE[s]), A[t], Math.abs(CHARGE[t]),
                        n[s], n[t], KT, 2.3e-8);
            }
        }
        return new BurgersFlow(mass, CHARGE, n, KT, k);
    }

    private static double[] densities() {
        double rho = 0.19;
        double nH = rho * 0.74 / Constants.M_U;
        double nHe = rho * 0.245 / (4 * Constants.M_U);
        double nO = rho * 0.015 / (16 * Constants.M_U);
        return new double[] {nH, nHe, nH + 2 * nHe + 8 * nO, nO};
    }

    @Test
    void noMassFlowAndNoCurrent() {
        // the two closing conditions of Burgers' system (Thoul, Bahcall & Loeb 1994, section 2)
        double[] n = densities();
        for (boolean heat : new boolean[] {true, false}) {
            double[] w = flow(n).velocities(new double[] {-3e-10, -2e-10, -2.5e-10, -1e-10}, -1e-10, heat);
            double mass = 0.0;
            double current = 0.0;
            double scale = 0.0;
            for (int s = 0; s < 4; s++) {
                mass += n[s] * A[s] * w[s];
                current += n[s] * CHARGE[s] * w[s];
                scale += n[s] * Math.abs(w[s]);
            }
            assertThat(Math.abs(mass)).isLessThan(1e-12 * scale);
            assertThat(Math.abs(current)).isLessThan(1e-12 * scale);
        }
    }

    @Test
    void aUniformIsothermalPlasmaStaysPut() {
        double[] w = flow(densities()).velocities(new double[4], 0.0, true);
        for (double v : w) {
            assertThat(v).isEqualTo(0.0, within(1e-30));
        }
    }

    @Test
    void velocitiesAreLinearInTheGradients() {
        // the equations are linear in the gradients: twice the gradients, twice the velocities (derived here)
        BurgersFlow f = flow(densities());
        double[] g = {-3e-10, -2e-10, -2.5e-10, -1e-10};
        double[] one = f.velocities(g, -1e-10, true);
        double[] two = f.velocities(new double[] {2 * g[0], 2 * g[1], 2 * g[2], 2 * g[3]}, -2e-10, true);
        for (int s = 0; s < 4; s++) {
            assertThat(two[s]).isCloseTo(2 * one[s], within(1e-9 * Math.abs(one[s])));
        }
    }
}
