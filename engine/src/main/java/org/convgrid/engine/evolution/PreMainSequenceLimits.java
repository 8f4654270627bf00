package org.convgrid.engine.evolution;

/**
 * Time-step limits that apply before the zero-age main sequence, on top of the main-sequence ones (common
 * practice: a contracting star is followed by the relative change of its radius, central temperature and
 * luminosity per step, and deuterium burning, which releases its energy over a few 1e5 yr, by the fraction of
 * the central deuterium burnt per step).
 *
 * @param maxLuminosityChange largest |D ln L| per step (replaces the main-sequence limit until the ZAMS)
 * @param maxRadiusChange largest |D ln R| per step
 * @param maxCentralTemperatureChange largest |D ln T_c| per step
 * @param maxDeuteriumBurnt largest fraction of the central deuterium burnt per step (while it holds more than
 *                          {@link #DEUTERIUM_FLOOR} of its start value)
 * @param firstStepFraction first step as a fraction of the start model's Kelvin-Helmholtz time G M^2/(R L)
 * @param maxGrowth largest ratio of consecutive steps (the contraction slows by orders of magnitude smoothly)
 * @param maxLithiumBurnt largest fraction of the surface 7Li burnt per step (while it holds more than
 *                        {@link #LITHIUM_FLOOR} of its start value). The envelope burns its lithium at the
 *                        trapezoid mean of the rates of the start- and end-of-step models, each with its own
 *                        zones, whose base burns at a rate ~T^18 ({@link LightElementBurning#corrected}): second
 *                        order in the step. Measured (YoungStepAccuracyProbe, Z = 0.02, every limit scaled by 1 /
 *                        0.5 / 0.25): 1 Msun log Li/Li_0 at 1 Gyr -0.580 / -0.573 / -0.571, lithium halved at
 *                        6.02 / 5.93 / 5.87 Myr; 0.5 Msun halved at 7.85 / 7.95 / 7.97 Myr; 0.1 Msun at 57.9 / 58.3
 *                        / 58.4 Myr (with the start-of-step rates alone, first order: -0.968 / -0.823 / -0.712, 5.02
 *                        / 5.28 / 5.45, 8.32 / 8.07 / 7.99 and 61.5 / 60.0 / 58.5). This limit no longer binds at
 *                        1 Msun; it stays at 0.3 for the halving ages below it, interpolated between steps: 0.45
 *                        saves 10-12 of ~90 steps before the ZAMS at 0.1-0.5 Msun but moves the halving of 0.3
 *                        Msun from 15.50 to 15.19 Myr and of 0.1 Msun from 57.9 to 57.3 Myr (finest 15.56, 58.4).
 *                        Before, with the start-of-step rates (first order), 1 Msun at 1 Gyr: without this limit
 *                        -4.30 or -3.55 depending on the requested ages; with 0.3, -3.09 and -3.10 (+10 steps);
 *                        with 0.1, -2.74 (+43 steps)
 * @param maxCentralBurningChange largest |D ln X| per step of the central 12C and 3He, which burn (12C) and build
 *                                up (3He) out of equilibrium until the zero-age main sequence and set how L_nuc/L
 *                                approaches it. It paces the next step and never rejects one: a convective core
 *                                that appears or grows mixes these abundances at once, a jump no shorter step
 *                                makes smaller
 * @param maxContractionShareChange largest |D ln(1 - L_nuc/L)| per step, 1 - L_nuc/L held at least
 *                                  1 - {@link NuclearLuminosity#ZERO_AGE_FRACTION}, once the central deuterium is
 *                                  below {@link #DEUTERIUM_FLOOR} of its start: the share of L the contraction
 *                                  still supplies. Near the zero-age main sequence L_nuc/L creeps towards 1 while
 *                                  L, R and T_c hardly change, so without it the steps grew by the full factor per
 *                                  step and the criterion was crossed in steps of several Myr (2 Msun: L_nuc/L
 *                                  0.980 to 0.996 in one step of 3.7 Myr). Paces the next step, never rejects one
 *                                  (rejecting on it, measured, spent the retry budget of 2 and 3 Msun tracks: near
 *                                  the ZAMS this share moves by amounts a shorter step does not reduce)
 * @param maxContractionChange largest |D ln L|, |D ln R| and |D ln T_c| per step instead of the three above while
 *                             the centre is convective and nuclear burning supplies less than
 *                             {@link #CONTRACTION_NUCLEAR_FRACTION} of L: the fully convective contraction on the
 *                             Hayashi track before and after deuterium burning, which is smooth and nearly
 *                             homologous and on which the zero-age main-sequence age hardly depends. Measured
 *                             (ZamsArrivalProbe): applied also after the radiative core appears, 0.2 moved the ZAMS
 *                             ages of 2 and 3 Msun by 3.6 and 5.3 % when every limit was halved (1.5 and 1.3 %
 *                             without it): the radiative contraction of those stars leads straight into the approach
 */
public record PreMainSequenceLimits(double maxLuminosityChange, double maxRadiusChange,
                                    double maxCentralTemperatureChange,
                                    double maxDeuteriumBurnt, double firstStepFraction, double maxGrowth,
                                    double maxLithiumBurnt, double maxCentralBurningChange,
                                    double maxContractionShareChange, double maxContractionChange) {

    /**
     * Below this L_nuc/L, in a star with a convective centre, the contraction limit {@link #maxContractionChange()}
     * replaces the ln L, ln R and ln T_c limits.
     */
    public static final double CONTRACTION_NUCLEAR_FRACTION = 0.01;

    /**
     * Below this fraction of its start value the central deuterium no longer limits the step (what is left then
     * supplies under ~1 % of the luminosity).
     */
    public static final double DEUTERIUM_FLOOR = 1.0e-2;
    /**
     * Below this fraction of its start value the surface lithium no longer limits the step: a star that has burnt
     * 99.9 % of its lithium reports it as gone (3 dex is beyond what spectra measure, common practice).
     */
    public static final double LITHIUM_FLOOR = 1.0e-3;

    /**
     * 0.1 in ln L, ln R and ln T_c, 30 % of the central deuterium, 5 % of the Kelvin-Helmholtz time, x1.5 per
     * step, 30 % of the surface 7Li, 0.4 in ln of the central 12C and 3He, 0.3 in ln of the contraction's share of
     * L, 0.2 in the fully convective contraction (the history of these values follows). Measured at 1 Msun, Z = 0.02, to the ZAMS: 96 steps, ZAMS at 49.0 Myr (44.3
     * Myr when the steps also land on 1, 10 and 100 Myr), energy budget closed to 1 % (tested); all limits halved:
     * 191 steps, 41.2 Myr; 0.2 in ln L and 50 % of the deuterium (before the lithium limit): 56 steps instead of
     * 86, 54.6 Myr. The ZAMS age is first order in the step and not converged at these limits. (Figures before
     * the pacing by central 12C and 3He and by the contraction's share, 0.1 each in ln: with them, ZAMS ages of
     * 0.5-3 Msun, Z = 0.02, move by 1.3-3.4 % when every limit is halved, against 3-21 % without; measured with
     * ZamsArrivalProbe.) Where the ZAMS-age error comes from (1 Msun, ages {100 Myr}, BirthTracks -Dprobe.limits):
     * halving the 12C/3He pacing alone moves the ZAMS age by -1.0 Myr, the share pacing alone -0.9 Myr, ln L, ln R,
     * ln T_c, deuterium and lithium together -0.3 Myr, measured with the share at 0.3; raising the share limit to
     * 0.3 saves 25 steps but moves the ZAMS ages by 2.7-4.4 % when every limit is halved, and 0.25 in ln L, ln R,
     * ln T_c by 6.5 % (1 Msun): both were left out. Since then: 0.2 in ln of the central 12C and 3He (the composition
     * update before the ZAMS trace-limited, MainSequenceEvolver#YOUNG_TRACE_CHANGE) and 0.2 in ln L, ln R, ln T_c
     * while the centre is convective and L_nuc/L &lt; 0.01. Measured with ZamsArrivalProbe (-Dprobe.coarse=1,0.5,
     * steps to the requested 100 Myr or the age limit): 0.5, 1, 1.5, 2, 3 Msun take 144, 124, 175, 184, 190 steps
     * instead of 174, 146, 215, 224, 229, ZAMS ages 161.2, 39.91, 26.53, 11.41, 3.521 Myr, which move by 2.7, 3.5,
     * 1.0, 2.2, 1.3 % when every limit is halved (before: 1.9, 3.6, 1.5, 1.7, 1.5 %). The 12C/3He pacing at 0.2
     * without the trace limit moved the 1 Msun ZAMS age by 3.6 %; 0.2 in ln L, ln R, ln T_c at every L_nuc/L &lt;
     * 0.01 (radiative centres too) 3.6 % at 2 Msun and 5.3 % at 3 Msun; the share pacing at 0.3 5.6 % at 1 Msun,
     * and at 0.15 with everything else as now still 5.3 % (1 Msun 108 instead of 124 steps): the share of L paced at
     * 0.1 is what holds the ZAMS age, and the next saving needs a scheme whose error in that phase is second order.
     * That scheme: the error was implicit Euler in the energy equation, and with eps_grav in its two-step form before
     * the ZAMS (second order, MainSequenceEvolver#YOUNG_TWO_STEP_RATIO) the share and the 12C/3He pacing no longer
     * hold the ZAMS age: at 0.1/0.2 the ZAMS ages of 0.5, 1, 1.5, 2, 3 Msun are 154.3, 38.72, 26.29, 11.37, 3.494 Myr
     * (ZamsArrivalProbe, limits x1), with the share at 0.3 154.7, 39.25, 26.06, 11.22, 3.483, and with the share at
     * 0.3 and the 12C/3He pacing at 0.4 (now the defaults) 154.1, 39.21, 25.88, 11.32, 3.492 Myr in 112, 93, 116,
     * 123, 128 steps instead of 144, 124, 175, 181, 190; with every limit halved and quartered 154.2/153.5,
     * 37.99/37.87, 26.05/25.82, 11.17/11.19, 3.470/3.462 Myr. Against the finest values the defaults are 0.4, 3.5,
     * 0.2, 1.2, 0.9 % late (the one-step form at the old defaults: 5.0, 5.4, 2.7, 2.2, 1.7 %); the 1 and 2 Msun
     * ages carry what is left: near the ZAMS L_nuc/L creeps below 0.99 by ~0.005 per Myr while the growing
     * convective core mixes 12C inwards in jumps of a few 1e-3 in L_nuc/L, so the crossing moves by a few tenths of
     * a Myr with the step history. Looser, measured: the share at 0.5 crossed 0.99 at 3 Msun in a transient,
     * 2.71 instead of 3.46 Myr; the 12C/3He pacing at 0.8 moved 0.5 Msun to 160.3 Myr (+4.6 %); the contraction
     * limit at 0.3 saves 5 more steps but moves the lithium halving of 0.5 Msun from 8.35 to 8.67 Myr (finest:
     * 7.98).
     */
    public static final PreMainSequenceLimits DEFAULT = new PreMainSequenceLimits(0.1, 0.1, 0.1, 0.3, 0.05, 1.5,
            0.3, 0.4, 0.3, 0.2);

    public PreMainSequenceLimits {
        if (!(maxLuminosityChange > 0.0 && maxRadiusChange > 0.0 && maxCentralTemperatureChange > 0.0
                && maxDeuteriumBurnt > 0.0 && maxDeuteriumBurnt < 1.0 && firstStepFraction > 0.0 && maxGrowth > 1.0
                && maxLithiumBurnt > 0.0 && maxLithiumBurnt < 1.0 && maxCentralBurningChange > 0.0
                && maxContractionShareChange > 0.0 && maxContractionChange > 0.0)) {
            throw new IllegalArgumentException("pre-main-sequence limits must be positive (deuterium and lithium "
                    + "below 1, growth above 1)");
        }
    }

    /**
     * The limit on |D ln L|, |D ln R| or |D ln T_c| ({@code limit}) at the given L_nuc/L and state of the centre.
     */
    public double structureLimit(double limit, double nuclearFraction, boolean convectiveCentre) {
        return convectiveCentre && nuclearFraction < CONTRACTION_NUCLEAR_FRACTION ? maxContractionChange : limit;
    }

    /** All change limits multiplied by {@code factor} (2 for a coarse test); the burnt fraction stays below 0.5. */
    public PreMainSequenceLimits scaled(double factor) {
        return new PreMainSequenceLimits(factor * maxLuminosityChange, factor * maxRadiusChange,
                factor * maxCentralTemperatureChange, Math.min(0.5, factor * maxDeuteriumBurnt), firstStepFraction,
                maxGrowth, Math.min(0.5, factor * maxLithiumBurnt), factor * maxCentralBurningChange,
                factor * maxContractionShareChange, factor * maxContractionChange);
    }
}
