package org.convgrid.engine.batch;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import org.convgrid.engine.birth.Phase;
import org.convgrid.engine.birth.TrackPoint;
import org.convgrid.engine.evolution.EvolutionStep;
import org.convgrid.engine.evolution.MainSequenceEvolver;
import org.convgrid.engine.request.Age;
import org.convgrid.engine.request.ModelRequest;
import org.convgrid.engine.request.PhysicsOptions;
import org.convgrid.engine.structure.BuoyancyTravelTime;
import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * The g-mode period scale along the track of a gamma Dor-like star, 1.5 Msun, Z = 0.02, Y = 0.2771, no overshoot,
 * evolved from birth to 1.3 Gyr (central X from 0.703 at birth to ~0.36): the Pi_0 every evolution step carries into
 * the track files ({@link EvolutionStep#buoyancyTravelTime}).
 */
class PeriodSpacingAlongTheMainSequenceTest {

    /** Central X after which the step is taken as near the ZAMS: past the CN cycle's approach to equilibrium. */
    private static final double NEAR_ZAMS_CENTRAL_H = 0.68;
    /** Central X by which the step is taken as mid main sequence. */
    private static final double MID_MS_CENTRAL_H = 0.38;

    private static List<EvolutionStep> mainSequence;

    @BeforeAll
    static void evolve() {
        ModelRequest request = new ModelRequest("dpi1", 1.5 * Constants.M_SUN, 0.02, 0.2771,
                new Age.SinceBirth(1.3 * Constants.GYR), PhysicsOptions.DEFAULT);
        List<TrackPoint> track = new ArrayList<>();
        new GridRequests((first, points, events) -> track.addAll(points), MainSequenceEvolver.Settings.DEFAULT)
                .answers(List.of(request));
        mainSequence = track.stream().filter(p -> p.phase() == Phase.MAIN_SEQUENCE).map(TrackPoint::step)
                .filter(s -> s.centralHydrogen() <= NEAR_ZAMS_CENTRAL_H && s.centralHydrogen() >= MID_MS_CENTRAL_H)
                .toList();
    }

    private static double spacing(EvolutionStep step) {
        return BuoyancyTravelTime.periodSpacing(step.seismic().buoyancyTravelTime(), 1);
    }

    @Test
    void theDipoleSpacingFallsFromNearTheZamsToMidMainSequence() {
        // Delta Pi_1 decreases as a main-sequence g-mode pulsator evolves: the mu-gradient the convective core leaves
        // behind raises N just outside it (Miglio et al. 2008, MNRAS 386, 1487; from memory). Measured here: 3159 s at
        // X_c 0.683 (0.10 Gyr), 2994 s at 0.576 (0.54 Gyr), 2954 s at 0.455 (1.0 Gyr), 2944 s at 0.372 (1.25 Gyr),
        // before a receding core paced the steps (2026-12-05), which moved the 1-2 Gyr values by -2 to +0.5 % (README)
        assertThat(mainSequence).hasSizeGreaterThan(30);
        double first = meanOf(mainSequence.subList(0, 5));
        double last = meanOf(mainSequence.subList(mainSequence.size() - 5, mainSequence.size()));
        assertThat(last).isLessThan(0.96 * first);
        // monotonic within the known flicker: the mesh is fixed and not refined on composition gradients, so the
        // spacing wobbles from step to step as the core's edge moves across points (our own measurement, README:
        // up to 2.6 % above the lowest value before it, 2949 -> 2991 s at 0.68-0.81 Gyr where the core's top jumped
        // from m/M 0.072 to 0.079 and back to 0.075); 3.5 % allows for that and no more
        double lowest = spacing(mainSequence.get(0));
        for (EvolutionStep step : mainSequence) {
            double now = spacing(step);
            assertThat(now).as("Delta Pi_1 at %.4f Gyr, X_c %.4f", step.age() / Constants.GYR,
                    step.centralHydrogen()).isLessThan(1.035 * lowest);
            lowest = Math.min(lowest, now);
        }
    }

    @Test
    void piZeroStaysWhereGammaDorStarsAreMeasured() {
        // Pi_0 of gamma Dor stars from their Kepler period-spacing patterns lies at roughly 3500-5500 s, most near
        // 4000-4500 s (Van Reeth et al. 2016, A&A 593, A120; range from memory, hence loose). Measured here: 4160-4500 s
        for (EvolutionStep step : mainSequence) {
            assertThat(step.seismic().buoyancyTravelTime()).as("Pi_0 at %.4f Gyr", step.age() / Constants.GYR)
                    .isBetween(3500.0, 5500.0);
        }
    }

    private static double meanOf(List<EvolutionStep> steps) {
        return steps.stream().mapToDouble(PeriodSpacingAlongTheMainSequenceTest::spacing).average().orElseThrow();
    }
}
