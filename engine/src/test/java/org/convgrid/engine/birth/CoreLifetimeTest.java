package org.convgrid.engine.birth;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;

/**
 * The convective core's onset and lasting end along an evolution. Bookkeeping, no physics: common practice with no
 * single published source (an event that undoes itself has not happened, as for the radiative core's end).
 */
class CoreLifetimeTest {

    /** Feeds models at the given ages (Myr) with or without a core, all after the ZAMS at 30 Myr, centre radiative. */
    private static CoreLifetime mainSequence(double[] ages, boolean[] core) {
        CoreLifetime lifetime = new CoreLifetime();
        for (int i = 0; i < ages.length; i++) {
            lifetime.observe(ages[i], core[i], true, ages[i] >= 30.0);
        }
        return lifetime;
    }

    @Test
    void aCoreThatVanishesForAStepAndReturnsHasNotEnded() {
        // the review's 0.35 Msun star, Z = 0.02: core from 45 Myr, gone at 3009 Myr for one step, back to 5000 Myr
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
        CoreLifetime lifetime = new CoreLifetime();
        lifetime.observe(0.001, true, false, false);  // the fully convective star's one zone: no onset
        assertThat(lifetime.onset()).isNaN();
        lifetime.observe(0.002, true, true, false);   // a core before the ZAMS ...
        lifetime.observe(0.003, false, true, false);  // ... gone before it: a transient of the contraction
        assertThat(lifetime.onset()).isNaN();
        assertThat(lifetime.end()).isNaN();
        lifetime.observe(25.0, true, true, false);    // the main-sequence core, from before the ZAMS on
        lifetime.observe(40.0, true, true, true);
        assertThat(lifetime.onset()).isEqualTo(25.0);
        assertThat(lifetime.end()).isNaN();
    }
}
