package org.convgrid.engine.birth;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;

import org.convgrid.engine.convection.StabilityCriterion;
import org.convgrid.engine.evolution.EvolutionResult;
import org.convgrid.engine.evolution.MainSequenceEvolver;
import org.convgrid.engine.physics.StandardPhysics;
import org.convgrid.engine.request.PhysicsOptions;
import org.convgrid.engine.state.BirthAbundances;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.Test;

/**
 * A convective core that lasts until the central hydrogen runs out ends with the main sequence, not one step after
 * it; a core that vanishes on the main sequence keeps its own end. Common practice, no single published source: a
 * star's convective core is counted to the end of core-hydrogen burning when it is still there at exhaustion, and the
 * core's lifetime is then the main-sequence lifetime.
 */
class ConvectiveCoreEndTest {

    private static final double MYR = BirthTracks.MYR;

    /** Events as {@link LifeRecorder} reports them before the evolution adds the exhaustion age. */
    private static LifeEvents recorded(double coreOnsetMyr, double coreEndMyr) {
        return new LifeEvents(0.7 * MYR, Double.NaN, 16.6 * MYR, coreOnsetMyr * MYR, coreEndMyr * MYR, Double.NaN,
                Double.NaN, Double.NaN, Double.NaN);
    }

    @Test
    void aCoreThatVanishesInTheStepThatEndsTheMainSequenceEndsWithIt() {
        // 1.05 Msun, Z = 0.004, uniform overshoot 0.2 (a grid's life_events.csv before this rule): the core top fell
        // from m/M 0.00157 (X_c 1.09e-4) to 0.00078, below the 1e-3 threshold, in the step to X_c 9.79e-5, which
        // also crossed the end value 1e-4: the core "ended" at 5850.398 Myr, 0.017 Myr after the exhaustion age
        LifeEvents events = recorded(23.4, 5850.398).withCentralHydrogenExhausted(5850.381 * MYR);
        assertThat(events.convectiveCoreEnd()).isEqualTo(5850.381 * MYR).isEqualTo(events.centralHydrogenExhausted());
    }

    @Test
    void aCoreStillThereAfterTheLastStepEndsWithTheMainSequence() {
        // 3 Msun, Z = 0.02, uniform overshoot 0.2: the core's top at m/M 0.015 in the model past X_c = 1e-4, so no
        // model without it; the track ends there, so did the core (without this rule the cell was empty)
        LifeEvents events = recorded(2.52, Double.NaN).withCentralHydrogenExhausted(371.5031 * MYR);
        assertThat(events.convectiveCoreEnd()).isEqualTo(371.5031 * MYR);
    }

    @Test
    void aCoreThatVanishedOnTheMainSequenceKeepsItsEndHoweverCloseToExhaustion() {
        // 3 Msun, Z = 0.02, no overshoot: the core fell below the threshold at X_c 3.1e-4, 13 steps and 0.13 Myr
        // before the exhaustion age; it did vanish on the main sequence
        LifeEvents late = recorded(2.52, 298.0062).withCentralHydrogenExhausted(298.1373 * MYR);
        assertThat(late.convectiveCoreEnd()).isEqualTo(298.0062 * MYR);
        // 1.25 Msun, Z = 0.01: the small core vanishes 450 Myr before exhaustion
        LifeEvents early = recorded(14.69, 2685.673).withCentralHydrogenExhausted(3137.218 * MYR);
        assertThat(early.convectiveCoreEnd()).isEqualTo(2685.673 * MYR);
        // the 3He/12C-driven early core of 1 Msun, Z = 0.02 (gone at 154.8 Myr), with or without exhaustion on the
        // computed track
        assertThat(recorded(29.6, 154.8033).withCentralHydrogenExhausted(9700.0 * MYR).convectiveCoreEnd())
                .isEqualTo(154.8033 * MYR);
        assertThat(recorded(29.6, 154.8033).withCentralHydrogenExhausted(Double.NaN).convectiveCoreEnd())
                .isEqualTo(154.8033 * MYR);
    }

    @Test
    void withoutExhaustionOrWithoutACoreThereIsNothingToEnd() {
        // the track stopped at the grid's oldest age with the core still there: its end is not on the track
        assertThat(recorded(2.52, Double.NaN).withCentralHydrogenExhausted(Double.NaN).convectiveCoreEnd()).isNaN();
        // a star that never had a core reaches exhaustion with none
        assertThat(recorded(Double.NaN, Double.NaN).withCentralHydrogenExhausted(9700.0 * MYR).convectiveCoreEnd())
                .isNaN();
    }

    @Test
    void onARealTrackTheCoreEndsNoLaterThanTheMainSequenceAndWithItWhenStillThereInItsLastModel() {
        // 3 Msun, Z = 0.02, Y = 0.2771, uniform overshoot 0.2 from birth to exhaustion (~2 s): the star whose core
        // outlasts the main sequence in every grid with overshoot
        double z = 0.02;
        double y = 0.2471 + 1.5 * z;
        Composition birth = BirthAbundances.of(1.0 - y - z, z);
        var physics = StandardPhysics.create(new PhysicsOptions(1.8, 0.2, StabilityCriterion.SCHWARZSCHILD, 1.0),
                birth);
        BirthTrack track = new BirthEvolution(physics, MainSequenceEvolver.Settings.DEFAULT)
                .evolve(3.0 * Constants.M_SUN, birth, new double[0]);
        assertThat(track.result().end()).isEqualTo(EvolutionResult.EndReason.HYDROGEN_EXHAUSTED);
        LifeEvents events = track.events();
        List<TrackPoint> points = track.points();
        TrackPoint lastOnMainSequence = points.get(points.size() - 2);
        assertThat(lastOnMainSequence.step().centralHydrogen())
                .isGreaterThanOrEqualTo(MainSequenceEvolver.Settings.DEFAULT.endCentralHydrogen());
        assertThat(lastOnMainSequence.step().convectiveCoreMassFraction())
                .isGreaterThan(BirthEvolution.DEFAULT_CORE_THRESHOLD);
        assertThat(events.convectiveCoreOnset()).isLessThan(events.zeroAgeMainSequence());
        assertThat(events.convectiveCoreEnd()).isEqualTo(events.centralHydrogenExhausted());
        assertThat(events.convectiveCoreEnd()).isLessThan(track.result().endAge());
    }
}
