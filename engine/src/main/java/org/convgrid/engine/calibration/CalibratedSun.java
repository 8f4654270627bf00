package org.convgrid.engine.calibration;

import org.convgrid.engine.batch.ModelOutcome;

/**
 * The result of a solar calibration, cgs units.
 *
 * @param mixingLength calibrated alpha, pressure scale heights
 * @param helium calibrated initial Y
 * @param metals initial Z (from Z/X and Y)
 * @param metalsToHydrogen the Z/X aimed at (initial = present surface value: no diffusion)
 * @param age the calibration age, s
 * @param sun the calibrated model at that age, ready for the catalogue (model id {@code "calibrated-sun"})
 * @param radiusResidual ln(R / R_sun) of the calibrated model
 * @param luminosityResidual ln(L / L_sun) of the calibrated model
 * @param zeroAgeLuminosity luminosity of the zero-age model, erg s^-1
 * @param exhaustionAge core-hydrogen exhaustion age (the main-sequence lifetime), s
 * @param envelopeBaseRadiusFraction r/R at the base of the convective envelope
 * @param centralTemperature K
 * @param centralDensity g cm^-3
 * @param evolutions full evolutions computed (the final whole-life one included)
 * @param newtonSteps accepted Newton/Broyden steps
 */
public record CalibratedSun(double mixingLength, double helium, double metals, double metalsToHydrogen,
                            double age, ModelOutcome sun, double radiusResidual, double luminosityResidual,
                            double zeroAgeLuminosity, double exhaustionAge, double envelopeBaseRadiusFraction,
                            double centralTemperature, double centralDensity, int evolutions, int newtonSteps) {

    /** Catalogue model id of the calibrated Sun. */
    public static final String MODEL_ID = "calibrated-sun";
}
