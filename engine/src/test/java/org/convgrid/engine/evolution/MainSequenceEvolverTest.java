package org.convgrid.engine.evolution;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;

import org.convgrid.engine.request.ModelStatus;
import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.Test;

/**
 * Main-sequence tracks with the standard physics (Z = 0.0188, Y = 0.275, alpha = 1.8, Schwarzschild, no
 * overshoot). The 2 Msun track uses time-step limits twice the default (|D X_c| &lt;= 0.02) to keep the test
 * fast; the 1 Msun track uses the defaults.
 */
class MainSequenceEvolverTest {

    private static final double GYR = Constants.GYR;

    @Test
    void halvingTheTimeStepLimitsMovesTheSolarLifetimeByUnderOnePercent() {
        // Numerical convergence in time (common practice): the main-sequence lifetime of 1 Msun with
        // every step limit halved stays within 1 % of the default-step value.
        var zeroAge = EvolutionFixtures.zeroAge(EvolutionFixtures.SOLAR, 1.0);
        var physics = EvolutionFixtures.physics(EvolutionFixtures.SOLAR);
        double normal = new MainSequenceEvolver(physics, MainSequenceEvolver.Settings.DEFAULT)
                .evolve(zeroAge.model(), new double[] {0.0}).exhaustionAge();
        double fine = new MainSequenceEvolver(physics, MainSequenceEvolver.Settings.DEFAULT.scaled(0.5))
                .evolve(zeroAge.model(), new double[] {0.0}).exhaustionAge();
        assertThat(Math.abs(fine / normal - 1.0)).isLessThan(0.01);
    }

    @Test
    void theConvectiveEnvelopeOfALowMassStarDeepensWithAge() {
        // The base of the solar convective envelope sinks from r/R ~0.73 on the zero-age main sequence to 0.713
        // today in standard solar models (present value: Basu & Antia 1997; the zero-age value from memory):
        // the low-mass envelope deepens in radius as the core contracts and the star expands. Coarse steps
        // (limits twice the default) keep the test fast.
        var zeroAge = EvolutionFixtures.zeroAge(EvolutionFixtures.SOLAR, 0.8);
        var evolver = new MainSequenceEvolver(EvolutionFixtures.physics(EvolutionFixtures.SOLAR),
                MainSequenceEvolver.Settings.DEFAULT.scaled(2.0));
        EvolutionResult r = evolver.evolve(zeroAge.model(), new double[] {0.0, 5.0 * GYR, 10.0 * GYR});
        double[] base = r.models().stream()
                .mapToDouble(m -> m.model().convection().envelopeBaseRadiusFraction()).toArray();
        assertThat(base[1]).isLessThan(base[0]);
        assertThat(base[2]).isLessThan(base[1]);
        // and the star expands: R(10 Gyr) > R(0)
        assertThat(r.models().get(2).model().global().radius())
                .isGreaterThan(r.models().get(0).model().global().radius());
    }

    @Test
    void oneSolarMassExhaustsItsCoreHydrogenAtAboutElevenGyr() {
        var zeroAge = EvolutionFixtures.zeroAge(EvolutionFixtures.SOLAR, 1.0);
        var evolver = new MainSequenceEvolver(EvolutionFixtures.physics(EvolutionFixtures.SOLAR),
                MainSequenceEvolver.Settings.DEFAULT);
        EvolutionResult r = evolver.evolve(zeroAge.model(), new double[] {4.57 * GYR, 0.0, 15.0 * GYR});

        assertThat(r.end()).isEqualTo(EvolutionResult.EndReason.HYDROGEN_EXHAUSTED);
        // Sackmann, Boothroyd & Kraemer 1993, ApJ 418, 457: the Sun's core-hydrogen exhaustion at ~11 Gyr
        // (main-sequence span 10-11 Gyr); widened to 9-12 Gyr for analytic opacities and no diffusion
        assertThat(r.exhaustionAge() / GYR).isBetween(9.0, 12.0);
        // non-regression (this code, standard physics, default steps): 9.68 Gyr, moved from 9.62 by the low-temperature
        // opacity tables of Ferguson et al. 2005 as default (the zero-age Sun at alpha 1.8 larger and cooler, R 0.879
        // -> 0.911 Rsun, L 0.738 -> 0.732 Lsun; measured 9.678); 9.62 moved from 9.67 by the Planck-Larkin
        // weight of hydrogen's bound state in the equation of state (measured 9.619); 9.67 had been moved from 11.08
        // by the opacity corrected to OPAL (the zero-age Sun brighter, 0.738 against 0.639 Lsun) and the Krishna Swamy
        // atmosphere; 11.08 from 10.96 by the two-term H^- opacity, 10.96 from 10.85 by the envelope term. Frozen
        // from our own run, last set 2026-12-02 (commit 02cc0fb). Tolerance 0.05 Gyr (our choice): about the smallest
        // physics change listed here (0.05-0.06 Gyr); how far round-off and mesh changes move it is not measured here
        assertThat(r.exhaustionAge() / GYR).isCloseTo(9.68, within(0.05));

        List<EvolutionStep> steps = r.steps();
        // the Sun brightens on the main sequence: L(4.57 Gyr)/L(0) = 1/0.70 (Sackmann et al. 1993) or 1.40
        // (Gough 1981, Sol. Phys. 74, 21); loose, since our zero-age model is not a calibrated solar model
        EvolutionStep present = steps.stream().filter(s -> s.age() == 4.57 * GYR).findFirst().orElseThrow();
        assertThat(present.luminosity() / steps.get(0).luminosity()).isBetween(1.25, 1.50);
        for (int i = 1; i < steps.size(); i++) {
            assertThat(steps.get(i).luminosity()).isGreaterThan(steps.get(i - 1).luminosity());
        }
        // Sackmann et al. 1993: L grows to ~2.2 Lsun by the end of the main sequence (their end is later than
        // X_c = 1e-4); at X_c = 1e-4 we ask for a clear rise above the zero-age value only
        assertThat(steps.get(steps.size() - 1).luminosity() / steps.get(0).luminosity()).isBetween(2.0, 3.0);
        // the Sun has a radiative core throughout (no lasting convective core, common knowledge of solar models)
        assertThat(steps).allSatisfy(s -> assertThat(s.convectiveCoreMassFraction()).isZero());

        // requested ages: landed exactly (no interpolation); the zero-age request gets the zero-age model;
        // an age beyond exhaustion is past the main sequence
        assertThat(r.models().get(0).status()).isEqualTo(ModelStatus.OK);
        assertThat(r.models().get(0).model().global().centralHydrogen()).isBetween(0.3, 0.5);
        assertThat(r.models().get(1).model()).isSameAs(zeroAge.model());
        assertThat(r.models().get(2).status()).isEqualTo(ModelStatus.PAST_MAIN_SEQUENCE);
        // the time-step control: ~100-300 steps to exhaustion (common practice, no single source)
        assertThat(steps.size()).isBetween(100, 300);
    }

    @Test
    void twoSolarMassesKeepAConvectiveCoreThatShrinksInMass() {
        var zeroAge = EvolutionFixtures.zeroAge(EvolutionFixtures.SOLAR, 2.0);
        var evolver = new MainSequenceEvolver(EvolutionFixtures.physics(EvolutionFixtures.SOLAR),
                MainSequenceEvolver.Settings.DEFAULT.scaled(2.0));
        EvolutionResult r = evolver.evolve(zeroAge.model(), new double[] {0.3 * GYR});
        assertThat(r.end()).isEqualTo(EvolutionResult.EndReason.HYDROGEN_EXHAUSTED);
        List<EvolutionStep> steps = r.steps();
        // upper main-sequence stars burn by CNO in a convective core that recedes in mass as hydrogen is
        // used (Kippenhahn, Weigert & Weiss 2012, ch. 30-31: the opacity, dominated by electron scattering,
        // falls with X); checked while X_c > 0.05, after the core has settled (first 10 % of the life), allowing
        // 2e-3 in m/M for the boundary's jitter between steps (it moves by whole mesh cells: one rise of 1.07e-3
        // measured with the low-temperature opacity tables as default, which leave the core's physics unchanged)
        double life = r.exhaustionAge();
        double previousCore = Double.POSITIVE_INFINITY;
        int checked = 0;
        for (EvolutionStep s : steps) {
            if (s.age() < 0.1 * life || s.centralHydrogen() < 0.05) {
                continue;
            }
            assertThat(s.convectiveCoreMassFraction()).isPositive();
            assertThat(s.convectiveCoreMassFraction()).isLessThanOrEqualTo(previousCore + 2e-3);
            previousCore = s.convectiveCoreMassFraction();
            checked++;
        }
        assertThat(checked).isGreaterThan(10);
        double early = core(steps, 0.6);
        double late = core(steps, 0.1);
        assertThat(late).isLessThan(0.7 * early);
        // a convective core mixes its hydrogen: the central X of a cored star falls at a near-constant rate,
        // and the lifetime is far shorter than the Sun's (textbook scaling 10 Gyr M^-2.5 = 1.77 Gyr, common
        // practice; loose because our zero-age 2 Msun model is ~16 Lsun)
        assertThat(life / GYR).isBetween(0.5, 1.8);
        assertThat(r.models().get(0).status()).isEqualTo(ModelStatus.OK);
    }

    /** Convective-core mass fraction at the first step with X_c below {@code xc}. */
    private static double core(List<EvolutionStep> steps, double xc) {
        return steps.stream().filter(s -> s.centralHydrogen() < xc).findFirst().orElseThrow()
                .convectiveCoreMassFraction();
    }
}
