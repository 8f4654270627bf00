package org.convgrid.output.catalogue;

import java.util.List;
import java.util.stream.Stream;

/**
 * The column names of {@code catalogue.csv}, in the order fixed by conventions.md; the only place they are spelled.
 * {@link #FIXED} are required when reading; {@link #EXTENSIONS} follow them and may be missing from older
 * catalogues.
 */
public final class CatalogueColumns {

    public static final String MODEL_ID = "model_id";
    public static final String MASS_MSUN = "mass_msun";
    public static final String Z_INIT = "z_init";
    public static final String Y_INIT = "y_init";
    public static final String MIXING_LENGTH = "mixing_length";
    public static final String OVERSHOOT_HP = "overshoot_hp";
    public static final String AGE_GYR = "age_gyr";
    public static final String STATUS = "status";
    public static final String STATUS_DETAIL = "status_detail";
    public static final String LUMINOSITY_LSUN = "luminosity_lsun";
    public static final String RADIUS_RSUN = "radius_rsun";
    public static final String TEFF_K = "teff_k";
    public static final String LOG_G_CGS = "log_g_cgs";
    public static final String CENTER_TEMP_K = "center_temp_k";
    public static final String CENTER_DENSITY_CGS = "center_density_cgs";
    public static final String CENTER_H_FRAC = "center_h_frac";
    public static final String STRUCTURE_CLASS = "structure_class";
    public static final String CORE_CZ_MASS_FRAC = "core_cz_mass_frac";
    public static final String ENV_CZ_BASE_MASS_FRAC = "env_cz_base_mass_frac";
    public static final String ENV_CZ_BASE_RADIUS_FRAC = "env_cz_base_radius_frac";
    public static final String ENV_CZ_MASS_MSUN = "env_cz_mass_msun";
    public static final String TURNOVER_TIME_DAYS = "turnover_time_days";
    public static final String CONV_ZONES_MASS_FRAC = "conv_zones_mass_frac";
    public static final String SOLVER_ITERATIONS = "solver_iterations";

    /** Extension: the stability criterion, {@code schwarzschild} or {@code ledoux}. */
    public static final String CRITERION = "criterion";
    /** Extension: the opacity multiplier (1 = as published). */
    public static final String OPACITY_FACTOR = "opacity_factor";
    /** Extension: turnover time as the integral of dr / v_conv across the envelope, days. */
    public static final String TURNOVER_TIME_GLOBAL_DAYS = "turnover_time_global_days";

    /** The columns conventions.md fixes, in order. */
    public static final List<String> FIXED = List.of(MODEL_ID, MASS_MSUN, Z_INIT, Y_INIT, MIXING_LENGTH,
            OVERSHOOT_HP, AGE_GYR, STATUS, STATUS_DETAIL, LUMINOSITY_LSUN, RADIUS_RSUN, TEFF_K, LOG_G_CGS,
            CENTER_TEMP_K, CENTER_DENSITY_CGS, CENTER_H_FRAC, STRUCTURE_CLASS, CORE_CZ_MASS_FRAC,
            ENV_CZ_BASE_MASS_FRAC, ENV_CZ_BASE_RADIUS_FRAC, ENV_CZ_MASS_MSUN, TURNOVER_TIME_DAYS,
            CONV_ZONES_MASS_FRAC, SOLVER_ITERATIONS);

    /** Our own columns after the fixed ones, in order. */
    public static final List<String> EXTENSIONS = List.of(CRITERION, OPACITY_FACTOR, TURNOVER_TIME_GLOBAL_DAYS);

    /** The header convgrid writes. */
    public static final List<String> HEADER = Stream.concat(FIXED.stream(), EXTENSIONS.stream()).toList();

    private CatalogueColumns() {
    }
}
