package org.convgrid.engine.calibration;

import java.util.Objects;
import org.convgrid.engine.error.ConvgridException;
import org.convgrid.engine.evolution.MainSequenceEvolver;
import org.convgrid.engine.physics.atmosphere.AtmosphereChoice;
import org.convgrid.engine.units.Constants;

/**
 * What a solar calibration aims at and how hard it tries.
 *
 * <p>The metal content is fixed by the present surface ratio Z/X. The evolution has no element diffusion or
 * settling, so the surface composition of the model never changes (the convective envelope keeps its initial
 * X and Z): the initial Z/X equals the present surface Z/X, and for a trial Y the initial X = (1 - Y)/(1 + Z/X)
 * and Z = (Z/X) X. (With diffusion the initial ratio would be ~10-15 % higher, e.g. 0.0266 against 0.0231 for
 * GS98 in Asplund, Amarsi &amp; Grevesse 2021, Table 4.)
 *
 * @param age age of the Sun since the zero-age main sequence, s (Bahcall, Pinsonneault &amp; Wasserburg 1995:
 *            4.57 Gyr)
 * @param metalsToHydrogen present surface Z/X (Grevesse &amp; Sauval 1998: 0.0231)
 * @param startMixingLength first alpha tried, pressure scale heights
 * @param startHelium first initial Y tried
 * @param tolerance largest |ln(R/R_sun)| and |ln(L/L_sun)| accepted (IAU 2015 nominal R_sun, L_sun)
 * @param evolutionBudget full evolutions to the solar age allowed (the Jacobian's included)
 * @param evolution time-step settings of every evolution (the same for all, so residuals are smooth in the
 *                  unknowns)
 * @param atmosphere the grey T(tau) relation of the surface boundary; the calibrated mixing length belongs to it
 * @param settling whether helium and metals settle by microscopic diffusion during the evolution
 */
public record CalibrationSettings(double age, double metalsToHydrogen, double startMixingLength,
                                  double startHelium, double tolerance, int evolutionBudget,
                                  MainSequenceEvolver.Settings evolution, AtmosphereChoice atmosphere,
                                  boolean settling) {

    /**
     * 4.57 Gyr, Z/X = 0.0231 (GS98), start alpha = 1.8, Y = 0.27, tolerance 1e-4, 16 evolutions, the default
     * atmosphere.
     */
    public static final CalibrationSettings DEFAULT = new CalibrationSettings(4.57 * Constants.GYR, 0.0231, 1.8,
            0.27, 1.0e-4, 16, MainSequenceEvolver.Settings.DEFAULT, AtmosphereChoice.DEFAULT, true);

    public CalibrationSettings {
        ConvgridException.requireInRange("age", age / Constants.GYR, 1.0e-3, 13.0, "Gyr");
        ConvgridException.requireInRange("Z/X", metalsToHydrogen, 0.0, 0.1, "");
        ConvgridException.requireInRange("start alpha", startMixingLength, 0.3, 4.0, "H_P");
        ConvgridException.requireInRange("start Y", startHelium, 0.2, 0.4, "");
        Objects.requireNonNull(atmosphere, "atmosphere");
    }

    public CalibrationSettings withAge(double newAge) {
        return new CalibrationSettings(newAge, metalsToHydrogen, startMixingLength, startHelium, tolerance,
                evolutionBudget, evolution, atmosphere, settling);
    }

    public CalibrationSettings withMetalsToHydrogen(double ratio) {
        return new CalibrationSettings(age, ratio, startMixingLength, startHelium, tolerance, evolutionBudget,
                evolution, atmosphere, settling);
    }

    /** The same aims with another starting point of the search. */
    public CalibrationSettings withStart(double alpha, double y) {
        return new CalibrationSettings(age, metalsToHydrogen, alpha, y, tolerance, evolutionBudget, evolution,
                atmosphere, settling);
    }

    public CalibrationSettings withSettling(boolean on) {
        return new CalibrationSettings(age, metalsToHydrogen, startMixingLength, startHelium, tolerance,
                evolutionBudget, evolution, atmosphere, on);
    }

    public CalibrationSettings withAtmosphere(AtmosphereChoice choice) {
        return new CalibrationSettings(age, metalsToHydrogen, startMixingLength, startHelium, tolerance,
                evolutionBudget, evolution, choice, settling);
    }

    /** Initial hydrogen mass fraction for initial helium {@code y}: X = (1 - Y)/(1 + Z/X). */
    public double hydrogen(double y) {
        return (1.0 - y) / (1.0 + metalsToHydrogen);
    }

    /** Initial metal mass fraction for initial helium {@code y}: Z = (Z/X) X. */
    public double metals(double y) {
        return metalsToHydrogen * hydrogen(y);
    }
}
