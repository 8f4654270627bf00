package org.convgrid.engine.birth;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

/**
 * The convective core's onset and lasting end along an evolution. Bookkeeping, no physics: common practice with no
 * single published source (an event that undoes itself has not happened, as for the radiative core's end).
 */
class CoreLifetimeTest {

    private static final double THRESHOLD = 1.0e-3;
    /** No centre given: the events are dated at the models themselves. */
    private static final double UNKNOWN = Double.NaN;

    /**
     * Feeds models at the given ages (Myr) with or without a core, all after the ZAMS at 30 Myr, centre radiative,
     * without their centres' state (so each event is the model's own age).
     */
    private static CoreLifetime mainSequence(double[] ages, boolean[] core) {
        CoreLifetime lifetime = new CoreLifetime(THRESHOLD);
        for (int i = 0; i < ages.length; i++) {
            lifetime.observe(ages[i], UNKNOWN, UNKNOWN, core[i], true, ages[i] >= 30.0);
        }
        return lifetime;
    }

    @Test
    void aCoreThatVanishesForAStepAndReturnsHasNotEnded() {
        // a 0.35 Msun star, Z = 0.02: core from 45 Myr, gone at 3009 Myr for one step, back to 5000 Myr
        CoreLifetime returned = mainSequence(new double[] {10, 45, 1000, 3000, 3009, 3100, 5000},
                new boolean[] {false, true, true, true, false, true, true});
        assertThat(returned.onset()).isEqualTo(45.0);
        assertThat(returned.end()).isNaN();
    }

    @Test
    void theEndIsTheStartOfTheLastRunWithoutTheCore() {
        CoreLifetime flickered = mainSequence(new double[] {10, 45, 3009, 3100, 4000, 4500, 5000},
                new boolean[] {false, true, false, true, false, false, false});
        assertThat(flickered.onset()).isEqualTo(45.0);
        assertThat(flickered.end()).isEqualTo(4000.0);
        // a core that goes once and stays gone: its first model without it, as before
        CoreLifetime once = mainSequence(new double[] {10, 45, 154.8, 500}, new boolean[] {false, true, false, false});
        assertThat(once.end()).isEqualTo(154.8);
    }

    @Test
    void aCoreOfTheContractionIsForgottenAndAFullyConvectiveCentreIsNoCore() {
        CoreLifetime lifetime = new CoreLifetime(THRESHOLD);
        // the fully convective star's one zone: no onset
        lifetime.observe(0.001, UNKNOWN, UNKNOWN, true, false, false);
        assertThat(lifetime.onset()).isNaN();
        lifetime.observe(0.002, UNKNOWN, UNKNOWN, true, true, false);   // a core before the ZAMS ...
        lifetime.observe(0.003, UNKNOWN, UNKNOWN, false, true, false);  // ... gone before it: a transient
        assertThat(lifetime.onset()).isNaN();
        assertThat(lifetime.end()).isNaN();
        // the main-sequence core, from before the ZAMS on
        lifetime.observe(25.0, UNKNOWN, UNKNOWN, true, true, false);
        lifetime.observe(40.0, UNKNOWN, UNKNOWN, true, true, true);
        assertThat(lifetime.onset()).isEqualTo(25.0);
        assertThat(lifetime.end()).isNaN();
    }

    @Test
    void theAgesAreInterpolatedBetweenTheModelsAroundTheEvent() {
        // a 0.45 Msun star, [Fe/H] = -1: its core was gone at the step cut at the grid's 10 Gyr, 0.71 Gyr
        // after the model before; the centre's stability excess falls from +0.2 to -0.6 across it, so it crossed zero
        // a quarter of the way (once a later model confirms it stayed gone)
        CoreLifetime ended = new CoreLifetime(THRESHOLD);
        ended.observe(100.0, -0.5, 0.0, false, true, true);
        ended.observe(200.0, 0.1, 0.0005, false, true, true);  // a central zone below the threshold: no core yet
        // past it between the two, in ln(top): ln 2 / ln 5 = 0.4307 of the step (linearly it would be a quarter)
        ended.observe(300.0, 0.3, 0.0025, true, true, true);
        ended.observe(9290.0, 0.2, 0.03, true, true, true);
        ended.observe(10000.0, -0.6, 0.0, false, true, true);
        assertThat(ended.onset()).isCloseTo(200.0 + 100.0 * Math.log(2.0) / Math.log(5.0), within(1e-9));
        // gone in the track's last model only: not seen to stay gone, so dated there, equal to the track's end
        assertThat(ended.end()).isEqualTo(10000.0);
        ended.observe(13000.0, -0.9, 0.0, false, true, true);
        assertThat(ended.end()).isEqualTo(9467.5);
        // a star's one zone shrinking to a core (the centre convective at both): no crossing to read, its own age
        CoreLifetime fromWholeStar = new CoreLifetime(THRESHOLD);
        fromWholeStar.observe(1.0, -0.1, 0.0, false, true, false);
        fromWholeStar.observe(2.0, 0.5, 1.0, false, true, false);
        fromWholeStar.observe(3.0, 0.4, 0.3, true, true, false);
        assertThat(fromWholeStar.onset()).isEqualTo(3.0);
    }
}
