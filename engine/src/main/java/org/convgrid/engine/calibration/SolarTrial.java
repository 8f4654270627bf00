package org.convgrid.engine.calibration;

import org.convgrid.engine.evolution.EvolutionResult;
import org.convgrid.engine.structure.StellarModel;
import org.convgrid.engine.units.Constants;

/**
 * One trial Sun: a 1 Msun model evolved from the zero-age main sequence to the calibration age.
 *
 * @param mixingLength alpha, pressure scale heights
 * @param helium initial Y
 * @param metals initial Z
 * @param zeroAgeLuminosity luminosity of the zero-age model, erg s^-1
 * @param model the model at the calibration age
 * @param evolution the whole evolution (to the calibration age, or to core-hydrogen exhaustion for the final one)
 */
public record SolarTrial(double mixingLength, double helium, double metals, double zeroAgeLuminosity,
                         StellarModel model, EvolutionResult evolution) {

    /** ln(R / R_sun), R_sun the IAU 2015 nominal radius. */
    public double radiusResidual() {
        return Math.log(model.global().radius() / Constants.R_SUN);
    }

    /** ln(L / L_sun), L_sun the IAU 2015 nominal luminosity. */
    public double luminosityResidual() {
        return Math.log(model.global().luminosity() / Constants.L_SUN);
    }

    /** The larger of the two residuals in absolute value. */
    public double worstResidual() {
        return Math.max(Math.abs(radiusResidual()), Math.abs(luminosityResidual()));
    }

    /** Newton iterations of every accepted step up to the calibration age. */
    int iterationsToAge() {
        int sum = 0;
        double age = evolution.models().get(0).age();
        for (var s : evolution.steps()) {
            if (s.age() <= age) {
                sum += s.iterations();
            }
        }
        return sum;
    }
}
