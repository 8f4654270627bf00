package org.convgrid.engine.calibration;

import java.util.Objects;
import org.convgrid.engine.error.ConvgridException;
import org.convgrid.engine.evolution.MainSequenceEvolver;
import org.convgrid.engine.physics.atmosphere.AtmosphereChoice;
import org.convgrid.engine.units.Constants;

/**
 * What a solar calibration aims at and how hard it tries.
 *
 * <p>The metal content is fixed by the present surface ratio Z/X. Without settling the surface composition of the
 * model never changes (the convective envelope keeps its initial X and Z): the initial Z/X equals the present
 * surface Z/X, and for a trial Y the initial X = (1 - Y)/(1 + Z/X) and Z = (Z/X) X. With settling the initial Z/X
 * is found by {@link SolarCalibration} so that the envelope ends at the present one.
 *
 * <p>The default present Z/X is that of the Grevesse &amp; Noels (1993) mixture, 0.0245, the mixture the OPAL
 * opacity tables were computed for (Iglesias &amp; Rogers 1996): the opacity, through which Z moves the solar
 * structure most, then sees the metal content its tables assume. (Grevesse &amp; Sauval 1998 give 0.0231 for
 * their revised mixture; with GN93 tables that would pair one mixture's Z with another's proportions.)
 *
 * @param age age of the Sun since the zero-age main sequence, s (Bahcall, Pinsonneault &amp; Wasserburg 1995:
 *            4.57 Gyr)
 * @param metalsToHydrogen present surface Z/X (Grevesse &amp; Noels 1993: 0.0245)
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

    /** Present solar Z/X of the Grevesse &amp; Noels (1993) mixture, that of the OPAL GN93 tables (from memory). */
    public static final double GN93_METALS_TO_HYDROGEN = 0.0245;

    /**
     * 4.57 Gyr, Z/X = 0.0245 (GN93, the opacity tables' mixture), start alpha = 1.8, Y = 0.27, tolerance 1e-4, 16
     * evolutions, the default atmosphere, settling.
     */
    public static final CalibrationSettings DEFAULT = new CalibrationSettings(4.57 * Constants.GYR,
            GN93_METALS_TO_HYDROGEN, 1.8, 0.27, 1.0e-4, 16, MainSequenceEvolver.Settings.DEFAULT,
            AtmosphereChoice.DEFAULT, true);

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
