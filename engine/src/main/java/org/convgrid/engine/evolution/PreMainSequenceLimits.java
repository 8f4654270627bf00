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
 */
public record PreMainSequenceLimits(double maxLuminosityChange, double maxRadiusChange,
                                    double maxCentralTemperatureChange,
                                    double maxDeuteriumBurnt, double firstStepFraction, double maxGrowth) {

    /**
     * Below this fraction of its start value the central deuterium no longer limits the step (what is left then
     * supplies under ~1 % of the luminosity).
     */
    public static final double DEUTERIUM_FLOOR = 1.0e-2;

    /**
     * 0.1 in ln L, ln R and ln T_c, 30 % of the central deuterium, 5 % of the Kelvin-Helmholtz time, x1.5 per
     * step. Measured at 1 Msun: ~90 steps to the ZAMS (51 Myr) with the energy budget closed to 1 % (tested); twice
     * coarser limits save ~40 steps but no time, and move the ZAMS age to 57 Myr; half as coarse (0.05, 10 %, 1 %,
     * x1.25) gives 44 Myr with ~220 steps.
     */
    public static final PreMainSequenceLimits DEFAULT = new PreMainSequenceLimits(0.1, 0.1, 0.1, 0.3, 0.05, 1.5);

    public PreMainSequenceLimits {
        if (!(maxLuminosityChange > 0.0 && maxRadiusChange > 0.0 && maxCentralTemperatureChange > 0.0
                && maxDeuteriumBurnt > 0.0 && maxDeuteriumBurnt < 1.0 && firstStepFraction > 0.0 && maxGrowth > 1.0)) {
            throw new IllegalArgumentException("pre-main-sequence limits must be positive (deuterium below 1, "
                    + "growth above 1)");
        }
    }

    /** All change limits multiplied by {@code factor} (2 for a coarse test); the burnt fraction stays below 0.5. */
    public PreMainSequenceLimits scaled(double factor) {
        return new PreMainSequenceLimits(factor * maxLuminosityChange, factor * maxRadiusChange,
                factor * maxCentralTemperatureChange, Math.min(0.5, factor * maxDeuteriumBurnt), firstStepFraction,
                maxGrowth);
    }
}
