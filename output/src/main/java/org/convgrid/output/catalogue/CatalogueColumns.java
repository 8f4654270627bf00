package org.convgrid.output.catalogue;

import java.util.List;
import java.util.stream.Stream;
import org.convgrid.output.EcsvColumn;
import org.convgrid.output.IronAbundance;

/**
 * The columns of {@code catalogue.ecsv} (catalogue v2), in the order the README's "Catalogue" section fixes; the only
 * place their names, units, types and descriptions are spelled. {@link #FIXED} are required when reading;
 * {@link #EXTENSIONS} follow them, new ones only ever at the end (a catalogue of an earlier version holds a leading part
 * of them). One description depends on the run: {@link #FE_H_DEX}'s names the Sun its [Fe/H] is measured against
 * ({@link #described}).
 */
public final class CatalogueColumns {

    public static final String MODEL_ID = "model_id";
    public static final String MASS_MSUN = "mass_msun";
    public static final String Z_INIT = "z_init";
    public static final String Y_INIT = "y_init";
    public static final String MIXING_LENGTH = "mixing_length";
    public static final String OVERSHOOT_HP = "overshoot_hp";
    public static final String AGE_GYR = "age_gyr";
    public static final String PHASE = "phase";
    public static final String STATUS = "status";
    public static final String STATUS_DETAIL = "status_detail";
    public static final String LUMINOSITY_LSUN = "luminosity_lsun";
    public static final String RADIUS_RSUN = "radius_rsun";
    public static final String TEFF_K = "teff_k";
    public static final String LOG_G_CGS = "log_g_cgs";
    public static final String CENTRAL_TEMP_K = "central_temp_k";
    public static final String CENTRAL_DENSITY_CGS = "central_density_cgs";
    public static final String CENTRAL_H_FRAC = "central_h_frac";
    public static final String SURFACE_LI_REL = "surface_li_rel";
    public static final String STRUCTURE_CLASS = "structure_class";
    public static final String CORE_CZ_MASS_FRAC = "core_cz_mass_frac";
    public static final String CORE_CZ_RADIUS_FRAC = "core_cz_radius_frac";
    public static final String ENV_CZ_BASE_MASS_FRAC = "env_cz_base_mass_frac";
    public static final String ENV_CZ_BASE_RADIUS_FRAC = "env_cz_base_radius_frac";
    public static final String ENV_CZ_MASS_MSUN = "env_cz_mass_msun";
    public static final String TURNOVER_TIME_DAYS = "turnover_time_days";
    public static final String SOLVER_ITERATIONS = "solver_iterations";

    /** Extension: the stability criterion, {@code schwarzschild} or {@code ledoux}. */
    public static final String CRITERION = "criterion";
    /** Extension: the opacity multiplier (1 = as published). */
    public static final String OPACITY_SCALE = "opacity_scale";
    /** Extension: turnover time as the integral of dr / v_conv across the envelope, days. */
    public static final String TURNOVER_TIME_GLOBAL_DAYS = "turnover_time_global_days";
    /** Extension: m/M up to which the convective core is mixed, overshoot included. */
    public static final String CORE_MIXED_MASS_FRAC = "core_mixed_mass_frac";
    /** Extension: which overshoot profile {@link #OVERSHOOT_HP} is the length of. */
    public static final String OVERSHOOT_PROFILE = "overshoot_profile";
    /** Extension: spectroscopic [Fe/H] of z_init and y_init ({@link IronAbundance}); empty when Z = 0. */
    public static final String FE_H_DEX = "fe_h_dex";
    /**
     * Extension: the buoyancy travel time Pi_0 = 2 pi^2 / (integral of N dr / r over N^2 &gt; 0), s; the name the
     * profiles' meta gives it. Empty without a g-mode cavity.
     */
    public static final String BUOYANCY_PERIOD_PI0_S = "buoyancy_period_pi0_s";
    /** Extension: the dipole g-mode period spacing Delta Pi_1 = Pi_0 / sqrt(2), s; the profiles' meta name. */
    public static final String PERIOD_SPACING_L1_S = "period_spacing_l1_s";
    /** Extension: the asymptotic large separation of p modes, Delta nu = 1 / (2 integral of dr / c), microHz. */
    public static final String LARGE_SEPARATION_UHZ = "large_separation_uhz";
    /** Extension: the sound's travel time from the base of the surface convection zone up to the photosphere, s. */
    public static final String SURFACE_CZ_BASE_ACOUSTIC_DEPTH_S = "surface_cz_base_acoustic_depth_s";
    /** Extension: the sound's travel time from helium's second-ionisation dip of Gamma1 up to the photosphere, s. */
    public static final String HE_II_IONISATION_ACOUSTIC_DEPTH_S = "he_ii_ionisation_acoustic_depth_s";
    /** Extension: the star's moment of inertia about a diameter, g cm^2. */
    public static final String MOMENT_OF_INERTIA_G_CM2 = "moment_of_inertia_g_cm2";
    /** Extension: the convective envelope's moment of inertia, g cm^2. */
    public static final String ENV_CZ_MOMENT_OF_INERTIA_G_CM2 = "env_cz_moment_of_inertia_g_cm2";

    private static final String REAL = "float64";
    private static final String TEXT = "string";

    /** Every column but {@link #FE_H_DEX}, in order, with its unit, type and one-line description. */
    private static final List<EcsvColumn> BEFORE_FE_H = List.of(
            new EcsvColumn(MODEL_ID, "", TEXT, "stable key built from the grid indices"),
            new EcsvColumn(MASS_MSUN, "solMass", REAL, "total mass"),
            new EcsvColumn(Z_INIT, "", REAL, "initial metal mass fraction"),
            new EcsvColumn(Y_INIT, "", REAL, "initial helium mass fraction"),
            new EcsvColumn(MIXING_LENGTH, "", REAL, "mixing length, in pressure scale heights"),
            new EcsvColumn(OVERSHOOT_HP, "", REAL, "overshoot length, in pressure scale heights"),
            new EcsvColumn(AGE_GYR, "Gyr", REAL, "age counted from the run's age origin"),
            new EcsvColumn(PHASE, "", TEXT, "pre_main_sequence or main_sequence; empty when status is not ok"),
            new EcsvColumn(STATUS, "", TEXT, "ok, not_converged, past_main_sequence or failed"),
            new EcsvColumn(STATUS_DETAIL, "", TEXT, "short reason when status is not ok"),
            new EcsvColumn(LUMINOSITY_LSUN, "solLum", REAL, "surface luminosity"),
            new EcsvColumn(RADIUS_RSUN, "solRad", REAL, "photospheric radius"),
            new EcsvColumn(TEFF_K, "K", REAL, "effective temperature"),
            new EcsvColumn(LOG_G_CGS, "dex(cm / s2)", REAL, "log10 of the surface gravity in cm s^-2"),
            new EcsvColumn(CENTRAL_TEMP_K, "K", REAL, "central temperature"),
            new EcsvColumn(CENTRAL_DENSITY_CGS, "g / cm3", REAL, "central density"),
            new EcsvColumn(CENTRAL_H_FRAC, "", REAL, "central hydrogen mass fraction"),
            new EcsvColumn(SURFACE_LI_REL, "", REAL, "surface 7Li number abundance over its initial value"),
            new EcsvColumn(STRUCTURE_CLASS, "", TEXT,
                    "fully_convective, conv_envelope, conv_core, conv_core_and_envelope or radiative"),
            new EcsvColumn(CORE_CZ_MASS_FRAC, "", REAL, "m/M at the top of the convective core; empty when none"),
            new EcsvColumn(CORE_CZ_RADIUS_FRAC, "", REAL, "r/R at the top of the convective core; empty when none"),
            new EcsvColumn(ENV_CZ_BASE_MASS_FRAC, "", REAL,
                    "m/M at the base of the convective envelope; empty when none, 0 when fully convective; seven"
                            + " significant digits of m/M, so few of a thin envelope's 1 - m/M (0.999998 is one):"
                            + " its mass is in env_cz_mass_msun"),
            new EcsvColumn(ENV_CZ_BASE_RADIUS_FRAC, "", REAL,
                    "r/R at the base of the convective envelope; empty when none, 0 when fully convective"),
            new EcsvColumn(ENV_CZ_MASS_MSUN, "solMass", REAL,
                    "mass of the convective envelope (the whole star when fully convective), to seven significant"
                            + " digits however thin the envelope; zones.csv gives the same number; empty when none"),
            new EcsvColumn(TURNOVER_TIME_DAYS, "d", REAL,
                    "local convective turnover time alpha H_P / v_c of the envelope, half a pressure scale height"
                            + " above its base but no higher than its radial midpoint; at r = R/2 when fully"
                            + " convective; empty when none"),
            new EcsvColumn(SOLVER_ITERATIONS, "", "int64", "Newton iterations for this model (an evolved one: every step from its start model to its age)"),
            new EcsvColumn(CRITERION, "", TEXT, "convective stability criterion: schwarzschild or ledoux"),
            new EcsvColumn(OPACITY_SCALE, "", REAL, "factor applied to every opacity (1 = as published)"),
            new EcsvColumn(TURNOVER_TIME_GLOBAL_DAYS, "d", REAL,
                    "integral of dr / v_conv across the convective envelope; empty when none"),
            new EcsvColumn(CORE_MIXED_MASS_FRAC, "", REAL,
                    "m/M up to which the convective core is mixed: its top carried outward by the uniform (or"
                            + " uniform-ramped) overshoot distance; with decaying overshoot, where the hydrogen"
                            + " leaves the centre's value (by 1 % of the surface-minus-centre contrast); the core's"
                            + " own top without overshoot; empty when no core"),
            new EcsvColumn(OVERSHOOT_PROFILE, "", TEXT,
                    "what overshoot_hp is the length of: uniform (alpha_ov for every star), uniform-ramped (alpha_ov"
                            + " from 2 solMass up, none up to 1.2 solMass, linear between) or decaying (f: the mixing's"
                            + " diffusion coefficient falls as exp(-2 z / (f H_P)), e-folding over f H_P / 2); empty in"
                            + " rows written before the column"));

    /** The columns after {@link #FE_H_DEX}, in order. */
    private static final List<EcsvColumn> AFTER_FE_H = List.of(
            new EcsvColumn(BUOYANCY_PERIOD_PI0_S, "s", REAL,
                    "buoyancy travel time Pi_0 = 2 pi^2 / (integral of N dr / r where N^2 > 0), the period scale of"
                            + " high-order g modes, in seconds, from the model's 500 points (4-6 % from how the"
                            + " composition term is differenced); empty when the star has no g-mode cavity (fully"
                            + " convective), when status is not ok, or in rows written before the column"),
            new EcsvColumn(PERIOD_SPACING_L1_S, "s", REAL,
                    "asymptotic period spacing of dipole g modes Delta Pi_1 = Pi_0 / sqrt(2), in seconds, rotation"
                            + " ignored; empty when buoyancy_period_pi0_s is"),
            new EcsvColumn(LARGE_SEPARATION_UHZ, "uHz", REAL,
                    "asymptotic large frequency separation of high-order p modes, Delta nu = 1 / (2 T), T the"
                            + " acoustic radius (integral of dr / c from the centre to the photosphere, c the adiabatic"
                            + " sound speed); no surface term, so a few per cent from the separation of computed or"
                            + " observed frequencies; empty when status is not ok, or in rows written before the"
                            + " column"),
            new EcsvColumn(SURFACE_CZ_BASE_ACOUSTIC_DEPTH_S, "s", REAL,
                    "acoustic depth of the base of the convective zone that reaches the surface (integral of dr / c"
                            + " from it up to the photosphere), however thin the zone (F stars' envelopes under the"
                            + " 1e-6 of the mass that env_cz_* need included), where glitch fits of the frequencies"
                            + " locate it; measured from the photosphere, not from the acoustic surface above it; empty"
                            + " when fully convective (no base, no glitch), when the surface is radiative, when status"
                            + " is not ok, or in rows written before the column"),
            new EcsvColumn(HE_II_IONISATION_ACOUSTIC_DEPTH_S, "s", REAL,
                    "acoustic depth of the minimum of Gamma1 that helium's second ionisation makes between 3e4 and"
                            + " 4e5 K, the other glitch of solar-like oscillators, measured from the photosphere; empty"
                            + " when the model shows no such dip, when status is not ok, or in rows written before the"
                            + " column"),
            new EcsvColumn(MOMENT_OF_INERTIA_G_CM2, "g cm2", REAL,
                    "moment of inertia about a diameter, (2/3) integral of r^2 dm over the star, non-rotating;"
                            + " empty when status is not ok, or in rows written before the column"),
            new EcsvColumn(ENV_CZ_MOMENT_OF_INERTIA_G_CM2, "g cm2", REAL,
                    "the convective envelope's part of moment_of_inertia_g_cm2, outside env_cz_base_mass_frac (the"
                            + " whole star when fully convective); the radiative interior's is the difference; empty"
                            + " when no envelope, when status is not ok, or in rows written before the column"));

    /** Every column convgrid writes for a run whose [Fe/H] is measured against the default Sun. */
    public static final List<EcsvColumn> DESCRIBED = described(IronAbundance.DEFAULT);

    /** The columns the README fixes, in order. */
    public static final List<String> FIXED = DESCRIBED.subList(0, 26).stream().map(EcsvColumn::name).toList();

    /** Our own columns after the fixed ones, in order. */
    public static final List<String> EXTENSIONS = DESCRIBED.subList(26, DESCRIBED.size()).stream()
            .map(EcsvColumn::name).toList();

    /** The header convgrid writes. */
    public static final List<String> HEADER = Stream.concat(FIXED.stream(), EXTENSIONS.stream()).toList();

    private CatalogueColumns() {
    }

    /** Every column convgrid writes, in order, with its unit, type and description, [Fe/H] against {@code iron}. */
    public static List<EcsvColumn> described(IronAbundance iron) {
        return Stream.of(BEFORE_FE_H.stream(),
                Stream.of(new EcsvColumn(FE_H_DEX, "dex", REAL, iron.columnDescription())),
                AFTER_FE_H.stream()).flatMap(columns -> columns).toList();
    }
}
