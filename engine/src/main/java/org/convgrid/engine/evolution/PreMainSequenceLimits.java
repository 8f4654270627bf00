package org.convgrid.engine.evolution;

/**
 * Time-step limits that apply before the zero-age main sequence, on top of the main-sequence ones (common
 * practice: a contracting star is followed by the relative change of its radius, central temperature and
 * luminosity per step, and deuterium burning, which releases its energy over a few 1e5 yr, by the fraction of
 * the central deuterium burnt per step).
 *
 * @param maxRadiusChange largest |D ln R| per step
 * @param maxCentralTemperatureChange largest |D ln T_c| per step
 * @param maxDeuteriumBurnt largest fraction of the central deuterium burnt per step (while it holds more than
 *                          {@link #DEUTERIUM_FLOOR} of its start value)
 * @param firstStepFraction first step as a fraction of the start model's Kelvin-Helmholtz time G M^2/(R L)
 */
public record PreMainSequenceLimits(double maxRadiusChange, double maxCentralTemperatureChange,
                                    double maxDeuteriumBurnt, double firstStepFraction) {

    /** Below this fraction of its start value the central deuterium no longer limits the step. */
    public static final double DEUTERIUM_FLOOR = 1.0e-3;

    /** 0.05 in ln R and ln T_c, 10 % of the central deuterium, 1 % of the Kelvin-Helmholtz time. */
    public static final PreMainSequenceLimits DEFAULT = new PreMainSequenceLimits(0.05, 0.05, 0.1, 0.01);

    public PreMainSequenceLimits {
        if (!(maxRadiusChange > 0.0 && maxCentralTemperatureChange > 0.0 && maxDeuteriumBurnt > 0.0
                && maxDeuteriumBurnt < 1.0 && firstStepFraction > 0.0)) {
            throw new IllegalArgumentException("pre-main-sequence limits must be positive (deuterium below 1)");
        }
    }

    /** All change limits multiplied by {@code factor} (2 for a coarse test); the burnt fraction stays below 0.5. */
    public PreMainSequenceLimits scaled(double factor) {
        return new PreMainSequenceLimits(factor * maxRadiusChange, factor * maxCentralTemperatureChange,
                Math.min(0.5, factor * maxDeuteriumBurnt), firstStepFraction);
    }
}
