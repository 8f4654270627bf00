package org.convgrid.engine.evolution;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;

import org.convgrid.engine.convection.StructureClass;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.structure.StellarModel;
import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.Test;

/**
 * Why the central hydrogen of a fully convective star rises in zero-age-origin evolution (0.1 Msun, Z = 0.008:
 * 0.7301 -&gt; 0.7326), and that it rises only by mixing. The zero-age model puts 3He and the CN pair at their
 * local equilibrium point by point, hydrogen paying the mass moved (the zero-age assumption of
 * {@code ZamsBuilder}); in a fully convective star that leaves the hot centre poorer in hydrogen than the rest of
 * the one convective zone, and the first step's mixing homogenises the zone: X_c jumps to the zone's mean. That
 * is mixing, not burning. From then on X_c only falls, and the star's hydrogen mass never grows (burning only
 * consumes it; mixing only moves it). From birth the abundances start uniform and the rise is absent
 * ({@code LowMassBirthTest}). The checks are conservation laws of mixing and burning (common practice, no single
 * published source).
 */
class ZeroAgeFullyConvectiveHydrogenTest {

    /** Z = 0.008, Y = 0.2485 + 1.5 Z (as BirthTracks; the README's helium law takes 0.2471 + 1.5 Z). */
    private static final Composition METAL_POOR = Composition.scaledSolar(1.0 - 0.2605 - 0.008, 0.008);

    @Test
    void centralHydrogenRisesOnlyByMixingAndThenOnlyFalls() {
        var zeroAge = EvolutionFixtures.zeroAge(METAL_POOR, 0.1).model();
        assertThat(zeroAge.convection().structureClass()).isEqualTo(StructureClass.FULLY_CONVECTIVE);
        List<StellarModel> models = new ArrayList<>();
        MainSequenceEvolver.Settings d = MainSequenceEvolver.Settings.DEFAULT.scaled(2.0);
        MainSequenceEvolver.Settings s = new MainSequenceEvolver.Settings(d.maxCentralHydrogenChange(),
                d.exhaustionFraction(), d.maxLuminosityChange(), d.maxGrowth(), d.endCentralHydrogen(),
                0.3 * Constants.GYR, d.stepBudget(), d.retryBudget());
        new MainSequenceEvolver(EvolutionFixtures.physics(METAL_POOR), s)
                .evolve(zeroAge, new double[] {0.3 * Constants.GYR}, (age, dt, model) -> models.add(model));
        assertThat(models.size()).isGreaterThan(3);

        // the cause: the zero-age centre holds less hydrogen than the zone's mean (3He made at local equilibrium)
        double zeroAgeMean = meanHydrogen(zeroAge);
        double zeroAgeCentre = zeroAge.global().centralHydrogen();
        assertThat(zeroAgeCentre).isLessThan(zeroAgeMean - 1.0e-3);

        double previousTotal = zeroAgeMean;
        for (int i = 1; i < models.size(); i++) {
            StellarModel before = models.get(i - 1);
            StellarModel after = models.get(i);
            // the star's hydrogen never grows (mass is conserved to the renormalisation's rounding)
            double total = meanHydrogen(after);
            assertThat(total).as("mean X after step %d", i).isLessThanOrEqualTo(previousTotal + 1.0e-12);
            previousTotal = total;
            // X_c can rise at most to the mean of the zone that mixes into the centre: the whole star here
            assertThat(after.global().centralHydrogen()).isLessThanOrEqualTo(meanHydrogen(before) + 1.0e-12);
            if (i > 1) {
                // once mixed, the centre only burns
                assertThat(after.global().centralHydrogen())
                        .isLessThanOrEqualTo(before.global().centralHydrogen() + 1.0e-12);
            }
        }
        // the one rise is the first step's mixing, to within what that step burnt
        assertThat(models.get(1).global().centralHydrogen()).isGreaterThan(zeroAgeCentre);
        assertThat(models.get(1).global().centralHydrogen()).isCloseTo(zeroAgeMean,
                org.assertj.core.api.Assertions.within(1.0e-5));
    }

    /** Mass-weighted mean hydrogen (1H + D) of the star. */
    private static double meanHydrogen(StellarModel model) {
        double[] w = PointCells.masses(model.state().mesh());
        double sum = 0.0;
        double mass = 0.0;
        for (int k = 0; k < w.length; k++) {
            sum += w[k] * model.state().composition(k).x();
            mass += w[k];
        }
        return sum / mass;
    }
}
