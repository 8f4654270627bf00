package org.convgrid.output.transitions;

import java.util.List;

/**
 * The column names of {@code transitions.csv}, version 2: the slice (composition, age, physics), the fully
 * convective limit and the lasting convective-core onset each with the two models that bracket it, the window of
 * transient small cores just above the fully convective limit, then notes, method and tolerance, then (added later,
 * at the end as every new column is) the main-sequence turn-off with its two models and the lithium depletion
 * boundary with its two models and its luminosity. Every mass is a real column of
 * its own (no packed {@code lo-hi} text); an empty cell means "not applicable".
 */
public final class TransitionColumns {

    public static final String Z_INIT = "z_init";
    public static final String Y_INIT = "y_init";
    /** Spectroscopic [Fe/H] of z_init and y_init (the catalogue's column of that name); empty when Z = 0. */
    public static final String FE_H_DEX = "fe_h_dex";
    public static final String AGE_GYR = "age_gyr";
    public static final String MIXING_LENGTH = "mixing_length";
    public static final String OVERSHOOT_HP = "overshoot_hp";
    /** Which profile {@link #OVERSHOOT_HP} is the length of (uniform, uniform-ramped or decaying). */
    public static final String OVERSHOOT_PROFILE = "overshoot_profile";
    public static final String CRITERION = "criterion";
    public static final String OPACITY_SCALE = "opacity_scale";
    /** Highest mass that is still fully convective. */
    public static final String FULLY_CONVECTIVE_LIMIT_MSUN = "fully_convective_limit_msun";
    public static final String FULLY_CONVECTIVE_BRACKET_LO_MSUN = "fully_convective_bracket_lo_msun";
    public static final String FULLY_CONVECTIVE_BRACKET_HI_MSUN = "fully_convective_bracket_hi_msun";
    /** The mass above which every model keeps a convective core. */
    public static final String CONV_CORE_ONSET_MSUN = "conv_core_onset_msun";
    public static final String CONV_CORE_BRACKET_LO_MSUN = "conv_core_bracket_lo_msun";
    public static final String CONV_CORE_BRACKET_HI_MSUN = "conv_core_bracket_hi_msun";
    /** Lowest and highest mass of the window of small central cores just above the fully convective limit. */
    public static final String TRANSIENT_CORE_LO_MSUN = "transient_core_lo_msun";
    public static final String TRANSIENT_CORE_HI_MSUN = "transient_core_hi_msun";
    public static final String NOTES = "notes";
    /** {@code grid} or {@code refined}. */
    public static final String METHOD = "method";
    /** The bracket width a refinement narrowed to; empty for {@code grid}. */
    public static final String TOLERANCE_MSUN = "tolerance_msun";
    /**
     * The main-sequence turn-off: the highest mass still on the main sequence at the slice's age, the lower end of
     * its bracket (as the fully convective limit is the lower end of its own); empty when every model is still on
     * the main sequence or none is.
     */
    public static final String TURNOFF_MASS_MSUN = "turnoff_mass_msun";
    /** The highest model with status ok below the turn-off. */
    public static final String TURNOFF_BRACKET_LO_MSUN = "turnoff_bracket_lo_msun";
    /** The lowest model with status past_main_sequence above it. */
    public static final String TURNOFF_BRACKET_HI_MSUN = "turnoff_bracket_hi_msun";

    /**
     * The lithium depletion boundary: the highest mass that still keeps more than 1 % of its birth lithium below the
     * lowest mass that has burnt 99 % of it, the lower end of its bracket (as the fully convective limit is); empty
     * when the slice's stars keep their lithium at every mass, when they have burnt it already at the lowest mass,
     * and when lithium is not followed (ages counted from the zero-age main sequence).
     */
    public static final String LI_DEPLETION_BOUNDARY_MSUN = "li_depletion_boundary_msun";
    /** The highest model below the boundary's depleted masses that keeps more than 1 % of its lithium. */
    public static final String LI_DEPLETION_BRACKET_LO_MSUN = "li_depletion_bracket_lo_msun";
    /** The lowest model that keeps 1 % or less of its lithium above it. */
    public static final String LI_DEPLETION_BRACKET_HI_MSUN = "li_depletion_bracket_hi_msun";
    /**
     * The luminosity of the model at {@link #LI_DEPLETION_BOUNDARY_MSUN}, solar units: the brightest star of the
     * slice that still keeps its lithium (the faintest that has burnt it is the bracket's upper model, a refinement
     * tolerance heavier), where a cluster's photometry locates the boundary.
     */
    public static final String LI_DEPLETION_BOUNDARY_LUMINOSITY_LSUN = "li_depletion_boundary_luminosity_lsun";

    /** The header convgrid writes, in order. */
    public static final List<String> HEADER = List.of(Z_INIT, Y_INIT, FE_H_DEX, AGE_GYR, MIXING_LENGTH, OVERSHOOT_HP,
            OVERSHOOT_PROFILE, CRITERION, OPACITY_SCALE, FULLY_CONVECTIVE_LIMIT_MSUN, FULLY_CONVECTIVE_BRACKET_LO_MSUN,
            FULLY_CONVECTIVE_BRACKET_HI_MSUN, CONV_CORE_ONSET_MSUN, CONV_CORE_BRACKET_LO_MSUN,
            CONV_CORE_BRACKET_HI_MSUN, TRANSIENT_CORE_LO_MSUN, TRANSIENT_CORE_HI_MSUN, NOTES, METHOD, TOLERANCE_MSUN,
            TURNOFF_MASS_MSUN, TURNOFF_BRACKET_LO_MSUN, TURNOFF_BRACKET_HI_MSUN, LI_DEPLETION_BOUNDARY_MSUN,
            LI_DEPLETION_BRACKET_LO_MSUN, LI_DEPLETION_BRACKET_HI_MSUN, LI_DEPLETION_BOUNDARY_LUMINOSITY_LSUN);

    /**
     * Columns a table written before them lacks (read as empty; {@link #FE_H_DEX} is never read, being computed
     * from z_init and y_init when the table is written again; a table without the turn-off or the lithium depletion
     * boundary reads as one without them, which the next rewrite from the catalogue finds).
     */
    public static final List<String> ADDED_LATER = List.of(OVERSHOOT_PROFILE, FE_H_DEX, TURNOFF_MASS_MSUN,
            TURNOFF_BRACKET_LO_MSUN, TURNOFF_BRACKET_HI_MSUN, LI_DEPLETION_BOUNDARY_MSUN, LI_DEPLETION_BRACKET_LO_MSUN,
            LI_DEPLETION_BRACKET_HI_MSUN, LI_DEPLETION_BOUNDARY_LUMINOSITY_LSUN);

    /** A column only the first layout (before version 2) had: its presence marks such a file. */
    public static final String VERSION_1_MARKER = "fully_convective_bracket_msun";

    private TransitionColumns() {
    }
}
