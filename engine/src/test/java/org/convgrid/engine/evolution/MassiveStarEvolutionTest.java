package org.convgrid.engine.evolution;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.convgrid.engine.request.ModelStatus;
import org.convgrid.engine.structure.MassMesh;
import org.convgrid.engine.structure.StellarModel;
import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.Test;

/**
 * A 15 Msun main sequence with the standard physics (Z = 0.0188, Y = 0.275, Schwarzschild, no overshoot). The
 * receding convective core of a massive star leaves jumps in X where mixed zones end; before the mesh cost of a
 * composition jump was capped ({@link MainSequenceEvolver#COMPOSITION_MESH_RESOLUTION}) every remesh packed points
 * into the interval holding a jump until two coincided, and the track stopped at ~10 Myr with its retry budget
 * spent. Coarse steps (limits twice the default, |D X_c| &lt;= 0.02, |D ln L| &lt;= 0.1) keep the test at a few
 * seconds (their lifetime is 7 % longer than with the default steps, see below).
 */
class MassiveStarEvolutionTest {

    private static final double MYR = 1.0e-3 * Constants.GYR;

    @Test
    void fifteenSolarMassesReachCoreHydrogenExhaustion() {
        var zeroAge = EvolutionFixtures.zeroAge(EvolutionFixtures.SOLAR, 15.0);
        var evolver = new MainSequenceEvolver(EvolutionFixtures.physics(EvolutionFixtures.SOLAR),
                MainSequenceEvolver.Settings.DEFAULT.scaled(2.0));
        EvolutionResult r = evolver.evolve(zeroAge.model(), new double[] {5.0 * MYR, 9.5 * MYR, 50.0 * MYR});

        assertThat(r.end()).as(r.detail()).isEqualTo(EvolutionResult.EndReason.HYDROGEN_EXHAUSTED);
        // loose sanity range; the measured comparison with published tracks is PublishedUpperMainSequenceTest
        // (Bertelli et al. 2009, A&A 508, 355: their 15 Msun, Z = 0.017, Y = 0.30, overshoot 0.25 H_P, 11.3 Myr;
        // ours at their inputs 11.6 Myr, and 12 % shorter without overshoot)
        assertThat(r.exhaustionAge() / MYR).isBetween(8.5, 13.0);
        // non-regression (this code, coarse steps): 10.86 Myr, 11.03 before the network's mid-step density and
        // temperature were carried across remeshes (every remeshed step had burnt at the start-of-step values,
        // first order in time; measured 10.859); 10.89 before the opacity was corrected to OPAL and the convective
        // core burnt as one mixed zone; the default steps gave 10.19 Myr and half of them 9.90 Myr then (the
        // lifetime converges at first order in the step: the receding core is mixed over the previous model's
        // extent). Frozen from our own run, last set 2026-12-03 (commit c80e16c). Tolerance 0.1 Myr (1 %, our choice):
        // below the 0.17 Myr the carried mid-step values moved it, far above round-off
        assertThat(r.exhaustionAge() / MYR).isCloseTo(10.86, within(0.1));
        assertThat(r.models().get(0).status()).isEqualTo(ModelStatus.OK);
        assertThat(r.models().get(1).status()).isEqualTo(ModelStatus.OK);
        assertThat(r.models().get(2).status()).isEqualTo(ModelStatus.PAST_MAIN_SEQUENCE);
        // the mesh stays resolvable in double precision wherever the composition changes (interior)
        for (int i = 0; i < 2; i++) {
            assertThat(narrowestInterior(r.models().get(i).model()))
                    .isGreaterThan(0.1 * MainSequenceEvolver.COMPOSITION_MESH_RESOLUTION);
        }
        // the convective core recedes in mass (Kippenhahn, Weigert & Weiss 2012, ch. 30-31)
        EvolutionStep first = r.steps().get(0);
        EvolutionStep last = r.steps().get(r.steps().size() - 1);
        assertThat(last.convectiveCoreMassFraction()).isLessThan(0.5 * first.convectiveCoreMassFraction());
        // a massive star has steps to spare: well within the step budget (~75 accepted steps here)
        assertThat(r.steps().size()).isBetween(40, 300);
    }

    /** Narrowest interval in m/M between m/M = 0.01 and 0.9 (where the composition profile lies). */
    private static double narrowestInterior(StellarModel model) {
        MassMesh mesh = model.state().mesh();
        double narrowest = 1.0;
        for (int k = 1; k < mesh.size(); k++) {
            if (mesh.fraction(k - 1) > 0.01 && mesh.fraction(k) < 0.9) {
                narrowest = Math.min(narrowest, mesh.fraction(k) - mesh.fraction(k - 1));
            }
        }
        return narrowest;
    }
}
