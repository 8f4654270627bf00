package org.convgrid.output.track;

import java.util.List;

/**
 * The columns of a track file and of its zone table, spelled once for {@link TrackWriter} and {@link TrackReader}.
 * Every cell holds one number or one label (no packed lists): the conventions' columns first (age, phase, surface,
 * centre, surface lithium, zone and burning-zone extents), then ours. The zone table lists every convective zone of
 * every step, one row each.
 */
public final class TrackColumns {

    public static final String AGE_GYR = "age_gyr";
    /** {@code pre_main_sequence} or {@code main_sequence}. */
    public static final String PHASE = "phase";
    public static final String LUMINOSITY = "luminosity_lsun";
    public static final String RADIUS = "radius_rsun";
    public static final String TEFF = "teff_k";
    public static final String LOG_G = "log_g_cgs";
    public static final String CENTRAL_TEMP = "central_temp_k";
    public static final String CENTRAL_DENSITY = "central_density_cgs";
    public static final String CENTRAL_H = "central_h_frac";
    /** Surface 7Li over its birth value; empty when lithium was not followed (tracks from the ZAMS). */
    public static final String SURFACE_LI = "surface_li_rel";
    /** m/M at the top of the convective zone that holds the centre (1 when fully convective); empty if none. */
    public static final String CENTRAL_CZ_TOP = "central_cz_top_mass_frac";
    /** m/M at the base of the convective zone that reaches the surface (0 when fully convective); empty if none. */
    public static final String ENV_CZ_BASE = "env_cz_base_mass_frac";
    /** How many convective zones the step has (each one a row of the zone table). */
    public static final String CONV_ZONE_COUNT = "conv_zone_count";
    /**
     * Inner m/M of the nuclear-burning region (eps_nuc above 1 % of its peak: deuterium early on the pre-main
     * sequence, hydrogen after it); empty when nothing burns.
     */
    public static final String BURNING_INNER = "burning_inner_mass_frac";
    /** Outer m/M of the nuclear-burning region; empty when nothing burns. */
    public static final String BURNING_OUTER = "burning_outer_mass_frac";
    /** L_nuc / L; empty for tracks from the ZAMS (not recorded there). */
    public static final String NUCLEAR_FRACTION = "nuclear_lum_frac";
    public static final String TIME_STEP = "time_step_yr";
    public static final String SOLVER_ITERATIONS = "solver_iterations";
    /**
     * The step's buoyancy travel time Pi_0, s, as the catalogue's column of the same name; empty without a g-mode
     * cavity and in track files written before the column.
     */
    public static final String BUOYANCY_PERIOD_PI0 = "buoyancy_period_pi0_s";
    /** The step's dipole g-mode period spacing Delta Pi_1 = Pi_0 / sqrt(2), s; empty when Pi_0 is. */
    public static final String PERIOD_SPACING_L1 = "period_spacing_l1_s";

    /**
     * m/M up to which the central convective zone is mixed, overshoot included: the catalogue's column of the same
     * name at every step; empty when the centre is radiative or the star fully convective, and in track files
     * written before the column.
     */
    public static final String CORE_MIXED = "core_mixed_mass_frac";
    /**
     * The step's asymptotic large separation Delta nu = 1 / (2 T) of p modes, microHz, as the catalogue's column of the
     * same name; empty in track files written before the column.
     */
    public static final String LARGE_SEPARATION = "large_separation_uhz";
    /**
     * The acoustic depth of the base of the step's surface convection zone below the photosphere, s, as the
     * catalogue's column of the same name; empty when fully convective or with a radiative surface
     * and in track files written before the column.
     */
    public static final String SURFACE_CZ_BASE_ACOUSTIC_DEPTH = "surface_cz_base_acoustic_depth_s";
    /** The acoustic depth of the step's helium second-ionisation dip of Gamma1, s, as the catalogue's column. */
    public static final String HE_II_IONISATION_ACOUSTIC_DEPTH = "he_ii_ionisation_acoustic_depth_s";
    /**
     * The step's local convective turnover time, days, as the catalogue's column of the same name (half a pressure
     * scale height above the envelope's base, at R/2 when fully convective); empty without an envelope and in track
     * files written before the column.
     */
    public static final String TURNOVER_TIME = "turnover_time_days";
    /** The step's integral of dr / v_c across the envelope, days, as the catalogue's column; empty with it. */
    public static final String TURNOVER_TIME_GLOBAL = "turnover_time_global_days";
    /** The step's moment of inertia, g cm^2, as the catalogue's column of the same name. */
    public static final String MOMENT_OF_INERTIA = "moment_of_inertia_g_cm2";
    /** The convective envelope's moment of inertia, g cm^2, as the catalogue's column; empty without an envelope. */
    public static final String ENV_CZ_MOMENT_OF_INERTIA = "env_cz_moment_of_inertia_g_cm2";

    /** Every column of a track file, in the order the writer writes them; new ones only ever at the end. */
    public static final List<String> ALL = List.of(AGE_GYR, PHASE, LUMINOSITY, RADIUS, TEFF, LOG_G, CENTRAL_TEMP,
            CENTRAL_DENSITY, CENTRAL_H, SURFACE_LI, CENTRAL_CZ_TOP, ENV_CZ_BASE, CONV_ZONE_COUNT, BURNING_INNER,
            BURNING_OUTER, NUCLEAR_FRACTION, TIME_STEP, SOLVER_ITERATIONS, BUOYANCY_PERIOD_PI0, PERIOD_SPACING_L1,
            CORE_MIXED, LARGE_SEPARATION, SURFACE_CZ_BASE_ACOUSTIC_DEPTH,
            HE_II_IONISATION_ACOUSTIC_DEPTH, TURNOVER_TIME, TURNOVER_TIME_GLOBAL, MOMENT_OF_INERTIA,
            ENV_CZ_MOMENT_OF_INERTIA);

    /** Row of the step in its track file, 0 = the first step. */
    public static final String STEP_INDEX = "step_index";
    public static final String ZONE_INDEX = "zone_index";
    public static final String MASS_FRAC_INNER = "mass_frac_inner";
    public static final String MASS_FRAC_OUTER = "mass_frac_outer";
    public static final String RADIUS_FRAC_INNER = "radius_frac_inner";
    public static final String RADIUS_FRAC_OUTER = "radius_frac_outer";

    /** Every column of a zone table ({@code tracks/<track id>.zones.csv}), in the order the writer writes them. */
    public static final List<String> ZONES = List.of(STEP_INDEX, AGE_GYR, ZONE_INDEX, MASS_FRAC_INNER,
            MASS_FRAC_OUTER, RADIUS_FRAC_INNER, RADIUS_FRAC_OUTER);

    /** The packed zone column of track files written before this layout: recognised only, to say so. */
    public static final String PACKED_ZONES_V1 = "conv_zones_mass_frac";

    private TrackColumns() {
    }
}
