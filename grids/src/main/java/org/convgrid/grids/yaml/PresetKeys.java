package org.convgrid.grids.yaml;

import java.util.List;

/** The keys of a physics preset file, shared by {@link PresetWriter} and {@link PresetReader}. */
final class PresetKeys {

    /** What the preset sets: alpha, pressure scale heights. */
    static final String MIXING_LENGTH = "mixing_length";
    /** What the preset sets: the T(tau) relation the mixing length belongs to. */
    static final String ATMOSPHERE = "atmosphere";
    static final String SETTLING = "settling";
    static final String Y_INIT = "y_init";
    static final String Z_INIT = "z_init";
    static final String Z_OVER_X = "z_over_x";
    static final String Z_OVER_X_INIT = "z_over_x_init";
    static final String AGE_GYR = "age_gyr";
    static final String TOOL_VERSION = "tool_version";
    static final String RESIDUAL_LN_RADIUS = "residual_ln_radius";
    static final String RESIDUAL_LN_LUMINOSITY = "residual_ln_luminosity";

    /** Every key a preset may hold. */
    static final List<String> ALL = List.of(MIXING_LENGTH, Y_INIT, Z_INIT, Z_OVER_X, AGE_GYR, TOOL_VERSION,
            RESIDUAL_LN_RADIUS, RESIDUAL_LN_LUMINOSITY, ATMOSPHERE, SETTLING, Z_OVER_X_INIT);
    /** The keys that only record the calibration: numbers, checked as such, not used by the grid. */
    static final List<String> RECORD_NUMBERS = List.of(Y_INIT, Z_INIT, Z_OVER_X, Z_OVER_X_INIT, AGE_GYR,
            RESIDUAL_LN_RADIUS, RESIDUAL_LN_LUMINOSITY);

    private PresetKeys() {
    }
}
