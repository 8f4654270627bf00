package org.convgrid.engine.zams;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;

import org.convgrid.engine.state.Composition;
import org.convgrid.engine.structure.ModelState;
import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.Test;

/** The shared rungs a grid line's chunks start from. */
class ZamsLadderTest {

    private static final Composition COMPOSITION = ZamsFixtures.PROTOSOLAR;
    /** Rung masses are exp(k 0.3) Msun up to rounding. */
    private static final double SAME = 1e-12;

    private static ZamsBuilder builder() {
        return new ZamsBuilder(ZamsFixtures.physics(COMPOSITION));
    }

    @Test
    void aRungIsTheSameWhicheverRequestBuildsItFirst() {
        ZamsLadder nearFirst = new ZamsLadder(builder(), COMPOSITION);
        nearFirst.startFor(0.6 * Constants.M_SUN);
        List<ZamsModel> afterNear = nearFirst.startFor(0.4 * Constants.M_SUN);
        ZamsLadder farFirst = new ZamsLadder(builder(), COMPOSITION);
        List<ZamsModel> farOnly = farFirst.startFor(0.4 * Constants.M_SUN);

        assertThat(farOnly).hasSameSizeAs(afterNear).hasSize(2);
        for (int i = 0; i < farOnly.size(); i++) {
            assertIdentical(farOnly.get(i).model().state(), afterNear.get(i).model().state());
        }
    }

    @Test
    void startsFromTheTwoRungsNextToTheMassOnTheAnchorSide() {
        ZamsLadder ladder = new ZamsLadder(builder(), COMPOSITION);
        // ln(0.4) / 0.3 = -3.05: rungs 2 and 3 below the anchor, none beyond the mass
        assertThat(massesOf(ladder.startFor(0.4 * Constants.M_SUN)))
                .containsExactly(new double[] {Math.exp(-0.6), Math.exp(-0.9)}, within(SAME));
        // between the anchor and rung 1 above it: those two, which bracket the mass
        assertThat(massesOf(ladder.startFor(1.2 * Constants.M_SUN)))
                .containsExactly(new double[] {1.0, Math.exp(0.3)}, within(SAME));
        assertThat(massesOf(ladder.startFor(Constants.M_SUN))).containsExactly(new double[] {1.0}, within(SAME));
    }

    @Test
    void theRungsNamedForAMassAreTheOnesItsStartReaches() {
        // ln(0.4) / 0.3 = -3.05: the anchor, then rungs 1 to 3 below it
        assertThat(ZamsLadder.rungsFor(0.4 * Constants.M_SUN)).containsExactly(0, -1, -2, -3);
        // rung +1 is seeded from the anchor and rung -1
        assertThat(ZamsLadder.rungsFor(1.2 * Constants.M_SUN)).containsExactly(0, -1, 1);
        assertThat(ZamsLadder.rungsFor(Constants.M_SUN)).containsExactly(0);
        assertThat(ZamsLadder.rungsFor(ZamsLadder.rungMass(2))).containsExactly(0, -1, 1, 2);
        assertThat(ZamsLadder.rungMass(-3) / Constants.M_SUN).isCloseTo(Math.exp(-0.9), within(SAME));

        // built ahead rung by rung, the start is the one a fresh ladder builds on demand
        ZamsLadder ahead = new ZamsLadder(builder(), COMPOSITION);
        for (int rung : ZamsLadder.rungsFor(0.4 * Constants.M_SUN)) {
            ahead.startFor(ZamsLadder.rungMass(rung));
        }
        List<ZamsModel> built = ahead.startFor(0.4 * Constants.M_SUN);
        List<ZamsModel> onDemand = new ZamsLadder(builder(), COMPOSITION).startFor(0.4 * Constants.M_SUN);
        assertThat(built).hasSameSizeAs(onDemand).hasSize(2);
        for (int i = 0; i < built.size(); i++) {
            assertIdentical(built.get(i).model().state(), onDemand.get(i).model().state());
        }
    }

    @Test
    void aModelStartedFromTheLadderIsTheColdStartedModel() {
        ZamsBuilder builder = builder();
        double mass = 0.6 * Constants.M_SUN;
        ZamsResult cold = ZamsTrack.solveOne(builder, COMPOSITION, mass, null);
        ZamsResult laddered = new ZamsTrack(builder, COMPOSITION, new ZamsLadder(builder, COMPOSITION)).solve(mass);

        assertThat(cold.converged()).isTrue();
        assertThat(laddered.converged()).isTrue();
        assertThat(laddered.model().coldStart()).isFalse();
        var a = cold.model().model().global();
        var b = laddered.model().model().global();
        // the same equations solved to the same tolerance from another start (common practice): only the mesh
        // history differs, which the grid comparison measured at <= 2e-4 in L, R and T_c
        assertThat(b.luminosity()).isCloseTo(a.luminosity(), within(1e-3 * a.luminosity()));
        assertThat(b.radius()).isCloseTo(a.radius(), within(1e-3 * a.radius()));
        assertThat(b.centralTemperature()).isCloseTo(a.centralTemperature(), within(1e-3 * a.centralTemperature()));
    }

    private static double[] massesOf(List<ZamsModel> models) {
        return models.stream().mapToDouble(z -> z.model().mass() / Constants.M_SUN).toArray();
    }

    private static void assertIdentical(ModelState a, ModelState b) {
        assertThat(b.size()).isEqualTo(a.size());
        for (int k = 0; k < a.size(); k++) {
            assertThat(b.lnRadius(k)).isEqualTo(a.lnRadius(k));
            assertThat(b.lnDensity(k)).isEqualTo(a.lnDensity(k));
            assertThat(b.lnTemperature(k)).isEqualTo(a.lnTemperature(k));
            assertThat(b.luminosity(k)).isEqualTo(a.luminosity(k));
        }
    }
}
