package org.convgrid.engine.zams;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.convgrid.engine.physics.eos.EosState;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.structure.ModelState;
import org.convgrid.engine.structure.StellarModel;
import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.Test;

/**
 * A seeded zero-age model whose first equation-of-state solves start from the neighbour's states
 * ({@link ZamsBuilder#fromSeed(ModelState, Composition, EosState[])}) is the model of the cold starts: the start of
 * the neutrality solve only moves where, within its own tolerance, it stops. Derived check (the same relaxation to
 * the solver's tolerance of 1e-8 in ln units; no published source).
 */
class NeighbourEquationOfStateTest {

    private static final Composition C = ZamsFixtures.PROTOSOLAR;

    @Test
    void theNeighboursStatesStartTheSameModel() {
        ZamsBuilder builder = new ZamsBuilder(ZamsFixtures.physics(C));
        ZamsModel lower = ZamsTrack.solveOne(builder, C, 0.90 * Constants.M_SUN, null).model();
        ZamsModel nearer = ZamsTrack.solveOne(builder, C, 0.95 * Constants.M_SUN, lower).model();
        ModelState seed = new HomologySeeder().seed(nearer.model(), lower.model(), Constants.M_SUN);
        EosState[] states = new EosState[seed.size()];
        for (int k = 0; k < states.length; k++) {
            states[k] = nearer.model().profile().eosState(k);
        }
        ZamsModel cold = builder.fromSeed(seed, C);
        ZamsModel warm = builder.fromSeed(seed, C, states);
        assertThat(warm.iterations()).isLessThanOrEqualTo(cold.iterations());
        StellarModel a = cold.model();
        StellarModel b = warm.model();
        assertThat(b.state().size()).isEqualTo(a.state().size());
        for (int k = 0; k < a.state().size(); k++) {
            assertThat(b.state().lnRadius(k)).as("ln r at %d", k).isCloseTo(a.state().lnRadius(k), within(1e-8));
            assertThat(b.state().lnDensity(k)).as("ln rho at %d", k).isCloseTo(a.state().lnDensity(k), within(1e-8));
            assertThat(b.state().lnTemperature(k)).as("ln T at %d", k)
                    .isCloseTo(a.state().lnTemperature(k), within(1e-8));
        }
        assertThat(b.global().luminosity() / a.global().luminosity()).isCloseTo(1.0, within(1e-8));
    }
}
