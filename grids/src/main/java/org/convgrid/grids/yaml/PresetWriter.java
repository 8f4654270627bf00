package org.convgrid.grids.yaml;

import java.util.Locale;
import java.util.function.DoubleFunction;
import org.convgrid.engine.physics.atmosphere.AtmosphereChoice;

/**
 * Writes the physics preset file that {@link PresetReader} reads (our own small YAML layout, the keys of
 * {@link PresetKeys}), as {@code convgrid calibrate-sun} leaves it. Writer and reader sit side by side so the
 * layout is spelled in one package.
 */
public final class PresetWriter {

    private PresetWriter() {
    }

    /**
     * What a solar calibration found, in the preset's units.
     *
     * @param mixingLength alpha, pressure scale heights
     * @param atmosphere the T(tau) relation the mixing length was calibrated with
     * @param settling whether helium and metals settled in the calibration
     * @param yInit initial helium mass fraction found
     * @param zInit initial metal mass fraction found
     * @param zOverX present surface Z/X aimed at
     * @param zOverXInit initial Z/X found
     * @param ageGyr the Sun's age, Gyr
     * @param toolVersion the version of convgrid that calibrated
     * @param residualLnRadius ln(R / R_sun) left
     * @param residualLnLuminosity ln(L / L_sun) left
     */
    public record Calibration(double mixingLength, AtmosphereChoice atmosphere, boolean settling, double yInit,
                              double zInit, double zOverX, double zOverXInit, double ageGyr, String toolVersion,
                              double residualLnRadius, double residualLnLuminosity) {
    }

    /**
     * The preset's text.
     *
     * @param numbers how numbers are written (the caller's table form, so the preset and the tables agree digit for
     *                digit)
     */
    public static String toYaml(Calibration c, DoubleFunction<String> numbers) {
        return String.format(Locale.ROOT, """
                # convgrid physics preset from a solar calibration (convgrid calibrate-sun).
                # A grid file that names this preset takes its mixing_length and atmosphere; y_init and z_init are
                # what the calibration found, for reference: the grid's metallicity section still sets each
                # model's Y and Z. settling says whether helium and metals settled in the calibration (grids
                # evolve without settling).
                %s: %s
                %s: %s
                %s: %s
                %s: %s
                %s: %s
                %s: %s
                %s: %s
                %s: %s
                %s: "%s"
                %s: %s
                %s: %s
                """, PresetKeys.MIXING_LENGTH, numbers.apply(c.mixingLength()),
                PresetKeys.ATMOSPHERE, c.atmosphere().label(),
                PresetKeys.SETTLING, c.settling(),
                PresetKeys.Y_INIT, numbers.apply(c.yInit()),
                PresetKeys.Z_INIT, numbers.apply(c.zInit()),
                PresetKeys.Z_OVER_X, numbers.apply(c.zOverX()),
                PresetKeys.Z_OVER_X_INIT, numbers.apply(c.zOverXInit()),
                PresetKeys.AGE_GYR, numbers.apply(c.ageGyr()),
                PresetKeys.TOOL_VERSION, c.toolVersion().replace("\"", ""),
                PresetKeys.RESIDUAL_LN_RADIUS, numbers.apply(c.residualLnRadius()),
                PresetKeys.RESIDUAL_LN_LUMINOSITY, numbers.apply(c.residualLnLuminosity()));
    }
}
