package org.convgrid.engine.zams;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.convgrid.engine.physics.PhysicsSet;
import org.convgrid.engine.physics.eos.EosState;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.structure.MassMesh;
import org.convgrid.engine.structure.ModelState;
import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.Test;

class EnvelopeSweepTest {

    private static final Composition C = ZamsFixtures.PROTOSOLAR;

    private static ZamsModel solved(double msun, ZamsModel seed) {
        ZamsResult r = ZamsTrack.solveOne(new ZamsBuilder(ZamsFixtures.physics(C)), C, msun * Constants.M_SUN, seed);
        assertThat(r.converged()).as("%s Msun", msun).isTrue();
        return r.model();
    }

    @Test
    void aRecedingOuterZoneIsSweptToTheNewMasssOwnEnvelope() {
        // 1.40 and 1.45 Msun end their outer convective zones 1.5 dex apart in 1 - m/M; at 1.50 Msun shells
        // convective in both are radiative, so the extrapolated seed is far off there and the swept one is not
        ZamsModel lower = solved(1.40, null);
        ZamsModel nearer = solved(1.45, lower);
        double mass = 1.50 * Constants.M_SUN;
        ModelState solution = solved(1.50, nearer).model().state();
        assertThat(Math.abs(EnvelopeSweep.outerZoneBase(nearer.model()) - EnvelopeSweep.outerZoneBase(lower.model())))
                .isGreaterThan(1.0);
        ModelState seed = new HomologySeeder().seed(nearer.model(), lower.model(), mass);
        PhysicsSet physics = ZamsFixtures.physics(C);
        ModelState swept = new EnvelopeSweep(physics).refine(seed, nearer.model(), lower.model(), mass);
        assertThat(worstThermalError(seed, solution)).isGreaterThan(0.3);
        assertThat(worstThermalError(swept, solution)).isLessThan(0.2);
        // radii, luminosities and the interior are the seed's own
        int swept0 = -1;
        for (int k = 0; k < seed.size(); k++) {
            assertThat(swept.lnRadius(k)).isEqualTo(seed.lnRadius(k));
            assertThat(swept.luminosity(k)).isEqualTo(seed.luminosity(k));
            if (swept0 < 0 && swept.lnTemperature(k) != seed.lnTemperature(k)) {
                swept0 = k;
            }
        }
        assertThat(seed.mesh().exteriorFraction(swept0)).isLessThan(EnvelopeSweep.OUTER_ENVELOPE);
        for (int k = 0; k < swept0; k++) {
            assertThat(swept.lnDensity(k)).isEqualTo(seed.lnDensity(k));
        }
        // the swept shells satisfy the solver's hydrostatic difference equation, ln P_b - ln P_a + G m dm /
        // (4 pi r_a^2 r_b^2 sqrt(P_a P_b)) = 0 (Kippenhahn, Weigert & Weiss 2012, ch. 10), to the sweep's last
        // correction
        MassMesh mesh = swept.mesh();
        for (int a = swept0; a < swept.size() - 1; a++) {
            int b = a + 1;
            double pa = pressure(physics, swept, a);
            double pb = pressure(physics, swept, b);
            double hydro = Constants.G * 0.5 * (mesh.mass(a) + mesh.mass(b)) * mesh.intervalMass(a)
                    / (4.0 * Math.PI * Math.exp(2.0 * swept.lnRadius(a) + 2.0 * swept.lnRadius(b)) * Math.sqrt(pa * pb));
            assertThat(Math.log(pb) - Math.log(pa) + hydro).as("point %d", a).isCloseTo(0.0, within(2e-3));
        }
        // and it saves Newton iterations: 7 without the sweep, measured
        ZamsBuilder builder = new ZamsBuilder(physics);
        assertThat(builder.fromSeed(swept, C).iterations()).isLessThan(builder.fromSeed(seed, C).iterations());
    }

    @Test
    void aDeepConvectiveEnvelopeIsLeftToTheExtrapolation() {
        // at 1 Msun the outer zone reaches deep and moves little between neighbours: the seed is returned as it is
        ZamsModel lower = solved(0.90, null);
        ZamsModel nearer = solved(0.95, lower);
        double mass = Constants.M_SUN;
        ModelState seed = new HomologySeeder().seed(nearer.model(), lower.model(), mass);
        assertThat(new EnvelopeSweep(ZamsFixtures.physics(C)).refine(seed, nearer.model(), lower.model(), mass))
                .isSameAs(seed);
    }

    private static double pressure(PhysicsSet physics, ModelState state, int k) {
        EosState s = physics.eos().atDensity(Math.exp(state.lnDensity(k)), Math.exp(state.lnTemperature(k)),
                state.composition(k));
        return s.pressure();
    }

    private static double worstThermalError(ModelState guess, ModelState solution) {
        double worst = 0.0;
        for (int k = 0; k < guess.size(); k++) {
            worst = Math.max(worst, Math.max(Math.abs(guess.lnTemperature(k) - solution.lnTemperature(k)),
                    Math.abs(guess.lnDensity(k) - solution.lnDensity(k))));
        }
        return worst;
    }
}
