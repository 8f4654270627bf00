package org.convgrid.engine.zams;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.convgrid.engine.state.Composition;
import org.convgrid.engine.structure.MassMesh;
import org.convgrid.engine.structure.ModelState;
import org.junit.jupiter.api.Test;

class HomologySeederTest {

    private static final Composition SOLAR = Composition.scaledSolar(0.70, 0.02);

    @Test
    void globalScalingFollowsTheHomologyRelations() {
        // Kippenhahn, Weigert & Weiss 2012, ch. 20: r ~ s^xR, rho ~ s^(1 - 3 xR), T ~ s^(1 - xR), L ~ s^xL
        ModelState state = synthetic(2.0e33, 0.0);
        double s = 1.1;
        ModelState scaled = HomologySeeder.scale(state, 2.2e33, 0.8, 3.5, null);
        for (int k = 0; k < state.size(); k++) {
            assertThat(scaled.lnRadius(k) - state.lnRadius(k)).isCloseTo(0.8 * Math.log(s), within(1e-12));
            assertThat(scaled.lnDensity(k) - state.lnDensity(k)).isCloseTo(-1.4 * Math.log(s), within(1e-12));
            assertThat(scaled.lnTemperature(k) - state.lnTemperature(k)).isCloseTo(0.2 * Math.log(s), within(1e-12));
            assertThat(scaled.luminosity(k) / state.luminosity(k)).isCloseTo(Math.pow(s, 3.5), within(1e-9));
        }
        assertThat(scaled.mesh().fraction(7)).isCloseTo(state.mesh().fraction(7), within(1e-15));
    }

    @Test
    void shellByShellExtrapolationIsExactForStructuresLinearInLnMass() {
        // each shell's ln T, ln rho, ln r and ln L vary linearly with ln M: the extrapolation must reproduce that
        ModelState a = synthetic(2.0e33, 0.0);
        ModelState b = synthetic(2.0e33 * Math.exp(0.1), 0.1);
        ModelState c = new HomologySeeder().extrapolate(b, a, 2.0e33 * Math.exp(0.25));
        ModelState expected = synthetic(2.0e33 * Math.exp(0.25), 0.25);
        for (int k = 0; k < c.size(); k++) {
            assertThat(c.lnTemperature(k)).isCloseTo(expected.lnTemperature(k), within(1e-9));
            assertThat(c.lnDensity(k)).isCloseTo(expected.lnDensity(k), within(1e-9));
            assertThat(c.lnRadius(k)).isCloseTo(expected.lnRadius(k), within(1e-9));
            assertThat(c.luminosity(k)).isCloseTo(expected.luminosity(k), within(1e-9 * expected.luminosity(k)));
        }
    }

    @Test
    void luminosityIsExtrapolatedInLnLWherePositiveAndLinearlyWhereNot() {
        // a whole step beyond neighbours a step apart, L falling to a quarter: in ln L a quarter again, never below 0
        assertThat(HomologySeeder.extrapolatedLuminosity(0.25, 1.0, 1.0)).isCloseTo(0.0625, within(1e-15));
        assertThat(HomologySeeder.extrapolatedLuminosity(0.0, 0.0, 1.0)).isEqualTo(0.0);
        assertThat(HomologySeeder.extrapolatedLuminosity(-1.0, -2.0, 0.5)).isCloseTo(-0.5, within(1e-15));
    }

    @Test
    void shellsAConvectiveZoneRecededFromKeepTheNearerModelsTemperatureAndDensity() {
        // shell 5 is convective in the lighter model only and its ln T jumps by 0.5 between the two (an exponent of 5
        // over their 0.1 in ln M, beyond HomologySeeder.RECEDING_ZONE_EXPONENT); shell 6 is convective in both
        ModelState a = synthetic(2.0e33, 0.0);
        ModelState b = shifted(synthetic(2.0e33 * Math.exp(0.1), 0.1), 5, 0.5);
        boolean[] lighter = new boolean[a.size()];
        boolean[] heavier = new boolean[b.size()];
        lighter[5] = true;
        lighter[6] = true;
        heavier[6] = true;
        HomologySeeder seeder = new HomologySeeder();
        double beyond = 2.0e33 * Math.exp(0.2);
        ModelState c = seeder.extrapolate(b, a, beyond, heavier, lighter);
        ModelState plain = seeder.extrapolate(b, a, beyond);
        // held: the nearer model's values, not the jump repeated
        assertThat(c.lnTemperature(5)).isCloseTo(b.lnTemperature(5), within(1e-12));
        assertThat(c.lnDensity(5)).isCloseTo(b.lnDensity(5), within(1e-12));
        assertThat(plain.lnTemperature(5)).isCloseTo(b.lnTemperature(5) + 0.5 + (0.2 - 0.01 * 5) * 0.1, within(1e-9));
        // radius and luminosity, and every other shell, are extrapolated as without the zones
        assertThat(c.lnRadius(5)).isCloseTo(plain.lnRadius(5), within(1e-12));
        assertThat(c.luminosity(5)).isCloseTo(plain.luminosity(5), within(1e-9 * plain.luminosity(5)));
        for (int k = 0; k < c.size(); k++) {
            if (k != 5) {
                assertThat(c.lnTemperature(k)).isCloseTo(plain.lnTemperature(k), within(1e-12));
                assertThat(c.lnDensity(k)).isCloseTo(plain.lnDensity(k), within(1e-12));
            }
        }
        // between the two models the zone may still cover the shell: interpolated as without the zones
        ModelState between = seeder.extrapolate(b, a, 2.0e33 * Math.exp(0.05), heavier, lighter);
        assertThat(between.lnTemperature(5)).isCloseTo(
                seeder.extrapolate(b, a, 2.0e33 * Math.exp(0.05)).lnTemperature(5), within(1e-12));
        // a small change (homology-sized) at a shell the zone left is extrapolated as usual
        ModelState gentle = seeder.extrapolate(synthetic(2.0e33 * Math.exp(0.1), 0.1), a, beyond, heavier, lighter);
        assertThat(gentle.lnTemperature(5)).isCloseTo(
                seeder.extrapolate(synthetic(2.0e33 * Math.exp(0.1), 0.1), a, beyond).lnTemperature(5), within(1e-12));
    }

    /** The state with ln T of point {@code k} raised by {@code dLnT}. */
    private static ModelState shifted(ModelState state, int k, double dLnT) {
        double[] lnT = state.lnTemperatures();
        lnT[k] += dLnT;
        return new ModelState(state.mesh(), state.compositions(), state.lnRadii(), state.lnDensities(), lnT,
                state.luminosities());
    }

    /** A made-up monotonic structure whose shells move linearly with lnM = ln(M/M0) = x. */
    private static ModelState synthetic(double mass, double x) {
        int n = 20;
        double[] q = new double[n];
        double[] e = new double[n];
        double[] lnR = new double[n];
        double[] lnRho = new double[n];
        double[] lnT = new double[n];
        double[] lum = new double[n];
        Composition[] comp = new Composition[n];
        for (int k = 0; k < n; k++) {
            q[k] = k == n - 1 ? 1.0 : 1e-6 + k * (1 - 1e-6) / (n - 1);
            e[k] = 1.0 - q[k];
            lnR[k] = 20 + Math.log(0.01 + q[k]) + (0.8 + 0.01 * k) * x;
            lnRho[k] = 4 - 10 * q[k] + (-1.4 + 0.02 * k) * x;
            lnT[k] = 16 - 5 * q[k] + (0.2 - 0.01 * k) * x;
            // L ~ M^xL (Kippenhahn, Weigert & Weiss 2012, ch. 20), with the exponent varying from shell to shell
            lum[k] = 1e33 * (q[k] + 0.001) * Math.exp((3.5 + 0.1 * k) * x);
            comp[k] = SOLAR;
        }
        return new ModelState(MassMesh.ofFractions(mass, q, e), comp, lnR, lnRho, lnT, lum);
    }
}
