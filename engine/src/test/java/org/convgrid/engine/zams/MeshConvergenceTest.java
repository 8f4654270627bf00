package org.convgrid.engine.zams;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.convgrid.engine.structure.HenyeySolver;
import org.convgrid.engine.structure.MeshPlanner;
import org.convgrid.engine.structure.StellarModel;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/** Doubling the mesh changes the model by much less than the physics uncertainties (practice, no source). */
class MeshConvergenceTest {

    private static final double LIMIT = 3e-3;

    @ParameterizedTest
    @ValueSource(doubles = {1.0, 0.6})
    void doublingThePointsChangesLuminosityRadiusAndEnvelopeBaseByUnderThreeTenthsOfAPerCent(double mass) {
        StellarModel coarse = ZamsFixtures.model(ZamsFixtures.PROTOSOLAR, mass).model();
        MeshPlanner fine = new MeshPlanner(2 * MeshPlanner.DEFAULT_POINTS);
        ZamsBuilder builder = new ZamsBuilder(ZamsFixtures.physics(ZamsFixtures.PROTOSOLAR), fine,
                HenyeySolver.Settings.DEFAULT);
        StellarModel refined = builder.fromSeed(fine.remesh(coarse), ZamsFixtures.PROTOSOLAR).model();

        assertThat(refined.state().size()).isEqualTo(2 * coarse.state().size());
        assertThat(refined.global().luminosity() / coarse.global().luminosity()).isCloseTo(1.0, within(LIMIT));
        assertThat(refined.global().radius() / coarse.global().radius()).isCloseTo(1.0, within(LIMIT));
        assertThat(refined.convection().envelopeBaseRadiusFraction())
                .isCloseTo(coarse.convection().envelopeBaseRadiusFraction(), within(LIMIT));
        assertThat(refined.convection().envelopeBaseMassFraction())
                .isCloseTo(coarse.convection().envelopeBaseMassFraction(), within(LIMIT));
    }
}
