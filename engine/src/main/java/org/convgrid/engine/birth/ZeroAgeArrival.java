package org.convgrid.engine.birth;

import org.convgrid.engine.evolution.NuclearLuminosity;

/**
 * Dates the zero-age main sequence along a track, model by model: L_nuc / L first reaches
 * {@link NuclearLuminosity#ZERO_AGE_FRACTION} (common practice: nuclear burning supplies ~99 % of L), linearly
 * interpolated in age, unless the star then falls back to shining largely by contraction, L_nuc / L below
 * {@link #FALLBACK_FRACTION}, before it has burnt {@link #SETTLED_HYDROGEN_BURNT} of its central hydrogen and
 * within {@link #FALLBACK_AGE_FACTOR} times the age of its first crossing (or at any age before then, below
 * {@link #CONTRACTING_FRACTION}). Such a
 * crossing was the out-of-equilibrium burning of the centre's 12C (and, with overshoot, of fresh 12C and 3He mixed
 * into the core) that lifts L_nuc / L above 0.99 for a while: with overshoot it fell back to 0.45-0.8 while the star
 * went on contracting (2 Msun, Z = 0.02, decaying overshoot f = 0.02: a crossing at 6.9 Myr at R = 2.11 Rsun, 8350 K,
 * then L_nuc / L down to 0.66 and contraction to 1.59 Rsun, 9235 K, by 13 Myr), so the "zero-age" model of an
 * {@code ms_fraction: 0} request was a contracting star, sometimes still without its convective core. The arrival is
 * then the next crossing. Shallower dips (to 0.95-0.98 after the peak, seen at 1.1-1.5 Msun without overshoot, where
 * the star hardly moves in the HR diagram) keep the first crossing; which of the two a star at the edge gets still
 * depends on whether its peak reaches 0.99 (README, life events). One instance per track; not thread-safe.
 */
final class ZeroAgeArrival {

    /**
     * Below this L_nuc / L, a star that has crossed {@link NuclearLuminosity#ZERO_AGE_FRACTION} is taken to have
     * fallen back to the contraction: a tenth of L from gravity is far from a main-sequence star (which needs under
     * 1 %), well below the 0.95-0.98 that the settling of the CN cycle leaves for tens of Myr at 1.1-1.5 Msun.
     * Our choice; no published source.
     */
    static final double FALLBACK_FRACTION = 0.9;
    /**
     * Central hydrogen burnt (absolute mass fraction, from the birth value) after which the arrival is settled: the
     * star is burning its hydrogen for good, and a later fall of L_nuc / L (the core's contraction near exhaustion)
     * is not a return to the pre-main sequence. 0.01 takes ~3 Myr at 3 Msun and ~100 Myr at 1 Msun, longer than
     * the carbon transients above. Our choice; no published source.
     */
    static final double SETTLED_HYDROGEN_BURNT = 0.01;

    /**
     * A fall back counts only before this multiple of the age of the first crossing. The contraction that follows
     * a carbon peak ends within about that (2 Msun, decaying overshoot f = 0.02: first crossing 6.9 Myr, arrival
     * 12.9 Myr; 1.5 Msun, Z = 0.02, uniform 0.2: 14.3 and 33.3 Myr, its fall below 0.9 at ~15 Myr). Later falls
     * come from a small core that comes and goes, mixing fresh 12C and 3He inwards in bursts (1.2 Msun, Z = 0.02,
     * decaying f = 0.02: L_nuc / L between 0.84 and 3.5 every 10-30 Myr for hundreds of Myr while L stays within
     * 1.4-1.7 Lsun): without this bound every burst moved the arrival, to 285 Myr. Our choice; no published source.
     */
    static final double FALLBACK_AGE_FACTOR = 2.0;
    /**
     * Below this L_nuc / L a crossing is undone at any age before {@link #SETTLED_HYDROGEN_BURNT}: a star shining
     * mostly by contraction again (say after a deuterium-burning phase that had supplied all of L; none of our
     * tracks has shown one above 0.97) is not on the main sequence, however late. The bursts above never fell below
     * 0.84. Our choice; no published source.
     */
    static final double CONTRACTING_FRACTION = 0.5;

    private double birthHydrogen = Double.NaN;
    private double firstCrossing = Double.NaN;
    private double arrival = Double.NaN;
    private boolean settled;
    private double lastAge;
    private double lastFraction;

    /**
     * Takes the next model of the track.
     *
     * @param age s since birth
     * @param nuclearFraction its L_nuc / L
     * @param centralHydrogen its central hydrogen mass fraction
     */
    void observe(double age, double nuclearFraction, double centralHydrogen) {
        if (Double.isNaN(birthHydrogen)) {
            birthHydrogen = centralHydrogen;
        } else {
            // the model that reaches the burnt share settles the arrival itself: its fall, if any, no longer counts
            settled = settled || birthHydrogen - centralHydrogen >= SETTLED_HYDROGEN_BURNT;
            if (Double.isNaN(arrival) && nuclearFraction >= NuclearLuminosity.ZERO_AGE_FRACTION) {
                arrival = AgeCrossing.of(lastAge, lastFraction, age, nuclearFraction,
                        NuclearLuminosity.ZERO_AGE_FRACTION);
                if (Double.isNaN(firstCrossing)) {
                    firstCrossing = arrival;
                }
            } else if (!settled && (nuclearFraction < CONTRACTING_FRACTION
                    || nuclearFraction < FALLBACK_FRACTION && age < FALLBACK_AGE_FACTOR * firstCrossing)) {
                arrival = Double.NaN;
            }
        }
        lastAge = age;
        lastFraction = nuclearFraction;
    }

    /**
     * The zero-age main-sequence age, s since birth; NaN when the track has not reached it. Provisional while the
     * track ends before {@link #SETTLED_HYDROGEN_BURNT} is burnt (a later fall-back would move it).
     */
    double age() {
        return arrival;
    }
}
