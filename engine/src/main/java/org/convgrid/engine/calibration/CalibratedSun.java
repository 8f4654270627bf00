package org.convgrid.engine.calibration;

import org.convgrid.engine.request.ModelOutcome;
import org.convgrid.engine.structure.StellarModel;

/**
 * The result of a solar calibration, cgs units.
 *
 * @param mixingLength calibrated alpha, pressure scale heights
 * @param helium calibrated initial Y
 * @param metals initial Z (from Z/X and Y)
 * @param metalsToHydrogen the present surface Z/X aimed at
 * @param age the calibration age, s
 * @param sun the calibrated model at that age, ready for the catalogue (model id {@code "calibrated-sun"})
 * @param model the whole calibrated model behind {@code sun}, settled as calibrated (for its profile)
 * @param radiusResidual ln(R / R_sun) of the calibrated model
 * @param luminosityResidual ln(L / L_sun) of the calibrated model
 * @param zeroAgeLuminosity luminosity of the zero-age model, erg s^-1
 * @param exhaustionAge core-hydrogen exhaustion age (the main-sequence lifetime), s
 * @param envelopeBaseRadiusFraction r/R at the base of the convective envelope
 * @param centralTemperature K
 * @param centralDensity g cm^-3
 * @param evolutions full evolutions computed (the final whole-life one included)
 * @param newtonSteps accepted Newton/Broyden steps (of the last composition iteration)
 * @param initialMetalsToHydrogen the initial Z/X found: equal to the aim without settling, higher with it
 * @param envelopeHelium Y of the convective envelope of the calibrated model (its surface value)
 * @param envelopeMetalsToHydrogen Z/X of the convective envelope of the calibrated model
 */
public record CalibratedSun(double mixingLength, double helium, double metals, double metalsToHydrogen,
                            double age, ModelOutcome sun, StellarModel model, double radiusResidual,
                            double luminosityResidual, double zeroAgeLuminosity, double exhaustionAge,
                            double envelopeBaseRadiusFraction, double centralTemperature, double centralDensity,
                            int evolutions, int newtonSteps, double initialMetalsToHydrogen, double envelopeHelium,
                            double envelopeMetalsToHydrogen) {

    /** Catalogue model id of the calibrated Sun. */
    public static final String MODEL_ID = "calibrated-sun";

    /** The same result with the evolution count replaced (summed over composition iterations). */
    CalibratedSun withEvolutions(int count) {
        return new CalibratedSun(mixingLength, helium, metals, metalsToHydrogen, age, sun, model, radiusResidual,
                luminosityResidual, zeroAgeLuminosity, exhaustionAge, envelopeBaseRadiusFraction, centralTemperature,
                centralDensity, count, newtonSteps, initialMetalsToHydrogen, envelopeHelium,
                envelopeMetalsToHydrogen);
    }
}
