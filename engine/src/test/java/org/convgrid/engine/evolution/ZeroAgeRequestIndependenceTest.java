package org.convgrid.engine.evolution;

import static org.assertj.core.api.Assertions.assertThat;

import org.convgrid.engine.state.Composition;
import org.convgrid.engine.structure.StellarModel;
import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.Test;

/**
 * A zero-age-origin star's model at one age does not depend on the other ages its grid asks for. Before the first
 * step's cap was a fixed time ({@link MainSequenceEvolver#ZERO_AGE_FIRST_STEP_CAP}) it was 0.01 x the oldest
 * requested age, and 1.2 Msun at 150 Myr (Z = 0.02) came out with L 2e-4 and its central convective zone's top 14 %
 * apart between the ages [150] and [150, 2000] Myr (ZeroAgeRequestProbe). Our own requirement: a grid is a set of
 * independent questions (the same as AgeRequestIndependenceTest asks of tracks from birth).
 */
class ZeroAgeRequestIndependenceTest {

    private static final double MYR = 1.0e-3 * Constants.GYR;
    private static final Composition SOLAR = Composition.scaledSolar(1.0 - 0.2785 - 0.02, 0.02);

    @Test
    void theModelAt150MyrIsTheSameWhateverTheOldestAge() {
        StellarModel alone = at150(150.0 * MYR, new double[] {150.0 * MYR});
        StellarModel withLater = at150(2000.0 * MYR, new double[] {150.0 * MYR, 2000.0 * MYR});
        assertThat(withLater.global().luminosity()).isEqualTo(alone.global().luminosity());
        assertThat(withLater.global().radius()).isEqualTo(alone.global().radius());
        assertThat(withLater.global().centralHydrogen()).isEqualTo(alone.global().centralHydrogen());
        assertThat(withLater.convection().zones()).isEqualTo(alone.convection().zones());
        // the star has the small central convective zone whose extent the old cap moved
        assertThat(alone.convection().zones().get(0).innerMassFraction()).isZero();
    }

    /** 1.2 Msun from its zero-age model, evolved (as a grid does) to the oldest of {@code ages}. */
    private static StellarModel at150(double oldest, double[] ages) {
        var zeroAge = EvolutionFixtures.zeroAge(SOLAR, 1.2).model();
        MainSequenceEvolver.Settings d = MainSequenceEvolver.Settings.DEFAULT;
        MainSequenceEvolver.Settings s = new MainSequenceEvolver.Settings(d.maxCentralHydrogenChange(),
                d.exhaustionFraction(), d.maxLuminosityChange(), d.maxGrowth(), d.endCentralHydrogen(), oldest,
                d.stepBudget(), d.retryBudget());
        return new MainSequenceEvolver(EvolutionFixtures.physics(SOLAR), s).evolve(zeroAge, ages, (a, dt, m) -> { })
                .models().get(0).model();
    }
}
