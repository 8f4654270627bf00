package org.convgrid.engine.evolution;

import static org.assertj.core.api.Assertions.assertThat;

import org.convgrid.engine.physics.PhysicsSet;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.structure.StellarModel;
import org.convgrid.engine.structure.StellarProfile;
import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.Test;

/**
 * 2 Msun tracks (Z = 0.0188, alpha = 1.8) with and without exponential overshoot, f = 0.016 for cores (Herwig
 * 2000, A&amp;A 360, 952). Coarse steps: time-step limits four times the default, to keep the test fast.
 */
class ExponentialOvershootTest {

    private static final double F_HERWIG = 0.016;
    private static final double PROBE_AGE = 0.5 * Constants.GYR;

    @Test
    void exponentialOvershootLengthensTheMainSequenceAndConservesSpecies() {
        StellarModel zeroAge = EvolutionFixtures.zeroAge(EvolutionFixtures.SOLAR, 2.0).model();
        MainSequenceEvolver.Settings coarse = MainSequenceEvolver.Settings.DEFAULT.scaled(4.0);
        EvolutionResult plain = new MainSequenceEvolver(EvolutionFixtures.physics(EvolutionFixtures.SOLAR),
                coarse).evolve(zeroAge, new double[] {PROBE_AGE});
        PhysicsSet physics = EvolutionFixtures.exponentialOvershoot(EvolutionFixtures.SOLAR, F_HERWIG);
        EvolutionResult over = new MainSequenceEvolver(physics, coarse).evolve(zeroAge, new double[] {PROBE_AGE});
        assertThat(plain.end()).isEqualTo(EvolutionResult.EndReason.HYDROGEN_EXHAUSTED);
        assertThat(over.end()).isEqualTo(EvolutionResult.EndReason.HYDROGEN_EXHAUSTED);
        // extra mixing beyond the core brings in fuel: the main sequence lasts longer (Herwig 2000, sect. 3;
        // f = 0.016 acts roughly like step overshoot of 0.1-0.2 H_P, from memory, order of magnitude only, so
        // the bound is loose: more than 3 %, less than a factor 1.6)
        double gain = over.exhaustionAge() / plain.exhaustionAge();
        assertThat(gain).isBetween(1.03, 1.6);

        // the diffusion conserves the mass of every species (telescoping fluxes, backward Euler; conservation
        // to rounding is the property of the scheme, no published value): one long step on an evolved model
        StellarModel evolved = over.models().get(0).model();
        StellarProfile p = evolved.profile();
        double[] s = physics.overshoot().diffusion(p, physics.convection().alpha()).orElseThrow();
        assertThat(java.util.Arrays.stream(s).max().orElse(0.0)).isPositive();
        var mesh = evolved.state().mesh();
        Composition[] before = evolved.state().compositions();
        double dt = 1.0e6 * Constants.YEAR;
        Composition[] after = SemiconvectiveMixing.diffuse(mesh, before, SemiconvectiveMixing.capped(mesh, s, dt),
                dt);
        double[] totalsBefore = TestMeshes.totals(mesh, before);
        double[] totalsAfter = TestMeshes.totals(mesh, after);
        for (int i = 0; i < totalsBefore.length; i++) {
            assertThat(Math.abs(totalsAfter[i] - totalsBefore[i]))
                    .isLessThanOrEqualTo(1e-8 * Math.abs(totalsBefore[i]) + 1e-14 * evolved.mass());
        }
        // and it did something: hydrogen moved somewhere beyond the core
        boolean changed = false;
        for (int k = 0; k < before.length; k++) {
            changed |= Math.abs(MassFractions.of(after[k])[0] - MassFractions.of(before[k])[0]) > 1e-6;
        }
        assertThat(changed).isTrue();
    }
}
