package org.convgrid.engine.birth;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

/**
 * The zero-age main sequence along a track: L_nuc / L reaching 0.99 (common practice, no single published source)
 * for good, a crossing followed by a fall back below 0.9 before 0.01 of the central hydrogen is burnt not counting
 * (our rule, {@link ZeroAgeArrival}). Bookkeeping on invented sequences shaped like the tracks that asked for it.
 */
class ZeroAgeArrivalTest {

    /** Feeds models at the given ages (Myr) with the given L_nuc / L and central hydrogen. */
    private static double arrival(double[] ages, double[] fractions, double[] hydrogen) {
        ZeroAgeArrival arrival = new ZeroAgeArrival();
        for (int i = 0; i < ages.length; i++) {
            arrival.observe(ages[i], fractions[i], hydrogen[i]);
        }
        return arrival.age();
    }

    private static double[] constant(int n, double value) {
        double[] a = new double[n];
        java.util.Arrays.fill(a, value);
        return a;
    }

    @Test
    void aSmoothApproachIsDatedWhereItCrosses() {
        // 0.98 at 10 Myr, 1.00 at 12 Myr: the crossing at 11 Myr, interpolated
        double[] ages = {0, 5, 10, 12, 20};
        double zams = arrival(ages, new double[] {0.0, 0.5, 0.98, 1.0, 1.0}, constant(5, 0.70));
        assertThat(zams).isCloseTo(11.0, within(1e-12));
    }

    @Test
    void aCarbonPeakAfterWhichTheStarContractsAgainIsNotTheArrival() {
        // shaped like the track of 2 Msun, Z = 0.02, decaying overshoot f = 0.02: 1.009 at 6.9 Myr, down to
        // 0.66, back above 0.99 at 13 Myr, before 0.01 of the central hydrogen is burnt
        double[] ages = {0, 6, 7, 8, 10, 12, 14, 100};
        double[] fractions = {0.0, 0.95, 1.009, 0.80, 0.66, 0.95, 1.03, 1.0};
        double[] hydrogen = {0.70, 0.70, 0.6999, 0.6998, 0.6997, 0.6995, 0.699, 0.65};
        assertThat(arrival(ages, fractions, hydrogen)).isCloseTo(12.0 + 2.0 * (0.99 - 0.95) / (1.03 - 0.95),
                within(1e-12));
    }

    @Test
    void burstsOfASmallCoreLongAfterTheFirstCrossingDoNotMoveTheArrival() {
        // shaped like the track of 1.2 Msun, Z = 0.02, decaying overshoot f = 0.02: bursts of L_nuc / L to 2-3
        // and falls to 0.84-0.89 every 10-30 Myr while little hydrogen burns. The fall at 47.6 Myr lies within twice
        // the first crossing (45 Myr) and undoes it; the falls from 117 Myr on do not
        double[] ages = {0, 44, 45.4, 47.6, 61, 65, 117, 146, 160};
        double[] fractions = {0.0, 0.98, 1.87, 0.88, 0.98, 2.06, 0.87, 0.84, 1.0};
        double[] hydrogen = {0.7028, 0.7004, 0.7022, 0.7021, 0.7007, 0.7004, 0.7003, 0.6998, 0.6983};
        double expected = 61.0 + 4.0 * (0.99 - 0.98) / (2.06 - 0.98);
        assertThat(arrival(ages, fractions, hydrogen)).isCloseTo(expected, within(1e-12));
    }

    @Test
    void aShallowDipKeepsTheFirstCrossing() {
        // shaped like 1.2 Msun, Z = 0.02 without overshoot: a peak of 0.992, then 0.955 for tens of Myr
        double[] ages = {0, 20, 25, 30, 50, 60};
        double[] fractions = {0.0, 0.95, 0.992, 0.955, 0.98, 0.995};
        assertThat(arrival(ages, fractions, constant(6, 0.70))).isCloseTo(20.0 + 5.0 * 0.04 / 0.042,
                within(1e-12));
    }

    @Test
    void aFallOnceTheHydrogenBurnsIsNotAReturnToThePreMainSequence() {
        // 0.011 of the central hydrogen burnt before L_nuc / L falls (a contracting core near exhaustion, or any
        // later excursion): the arrival stays
        double[] ages = {0, 10, 11, 500, 900};
        double[] fractions = {0.0, 0.5, 1.0, 1.0, 0.5};
        double[] hydrogen = {0.70, 0.70, 0.70, 0.689, 0.01};
        assertThat(arrival(ages, fractions, hydrogen)).isCloseTo(10.0 + 0.49 / 0.5, within(1e-12));
    }

    @Test
    void deuteriumBurningIsNeverTheArrival() {
        // a young star whose deuterium burning supplies all of L for a while, then the contraction resumes
        double[] ages = {0, 0.1, 0.3, 1, 10};
        assertThat(arrival(ages, new double[] {0.0, 1.0, 0.5, 0.01, 0.2}, constant(5, 0.70))).isNaN();
    }

    @Test
    void aCrossingFollowedByAFallBackAtTheTrackEndIsUndone() {
        double[] ages = {0, 5, 6, 7};
        assertThat(arrival(ages, new double[] {0.0, 1.0, 0.85, 0.9}, constant(4, 0.70))).isNaN();
    }
}
