package org.convgrid.output.track;

import java.util.List;

/**
 * The columns of a track file, spelled once for {@link TrackWriter} and {@link TrackReader}: the conventions'
 * columns first (age, surface, centre, zone extents), then ours (time step, core extent, solver iterations).
 */
public final class TrackColumns {

    public static final String AGE_GYR = "age_gyr";
    public static final String LUMINOSITY = "luminosity_lsun";
    public static final String RADIUS = "radius_rsun";
    public static final String TEFF = "teff_k";
    public static final String LOG_G = "log_g_cgs";
    public static final String CENTRAL_TEMP = "central_temp_k";
    public static final String CENTRAL_DENSITY = "central_density_cgs";
    public static final String CENTRAL_H = "central_h_frac";
    /** Every convective zone as {@code lo-hi} in m/M, centre outwards. */
    public static final String CONV_ZONES = "conv_zones_mass_frac";
    /** The hydrogen-burning region as {@code lo-hi} in m/M. */
    public static final String BURNING_ZONE = "burning_zone_mass_frac";
    public static final String TIME_STEP = "time_step_yr";
    public static final String CORE_CZ = "core_cz_mass_frac";
    public static final String SOLVER_ITERATIONS = "solver_iterations";

    /** Every column, in the order the writer writes them. */
    public static final List<String> ALL = List.of(AGE_GYR, LUMINOSITY, RADIUS, TEFF, LOG_G, CENTRAL_TEMP,
            CENTRAL_DENSITY, CENTRAL_H, CONV_ZONES, BURNING_ZONE, TIME_STEP, CORE_CZ, SOLVER_ITERATIONS);

    private TrackColumns() {
    }
}
