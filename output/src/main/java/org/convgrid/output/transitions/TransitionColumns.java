package org.convgrid.output.transitions;

import java.util.List;
import java.util.stream.Stream;

/** The column names of {@code transitions.csv}: the README's fixed columns ("Transition masses"), then our extensions. */
public final class TransitionColumns {

    public static final String Z_INIT = "z_init";
    public static final String AGE_GYR = "age_gyr";
    public static final String FULLY_CONVECTIVE_LIMIT_MSUN = "fully_convective_limit_msun";
    public static final String FULLY_CONVECTIVE_BRACKET_MSUN = "fully_convective_bracket_msun";
    public static final String CONV_CORE_ONSET_MSUN = "conv_core_onset_msun";
    public static final String CONV_CORE_BRACKET_MSUN = "conv_core_bracket_msun";
    public static final String METHOD = "method";

    public static final String MIXING_LENGTH = "mixing_length";
    public static final String OVERSHOOT_HP = "overshoot_hp";
    public static final String CRITERION = "criterion";
    public static final String OPACITY_SCALE = "opacity_scale";
    /** Number of state changes between neighbouring usable masses (1 for a clean transition). */
    public static final String FULLY_CONVECTIVE_CROSSINGS = "fully_convective_crossings";
    /** Every such change as {@code lo-hi}, joined by {@code ;}. */
    public static final String FULLY_CONVECTIVE_CROSSINGS_MSUN = "fully_convective_crossings_msun";
    /** Unusable models skipped inside the reported bracket. */
    public static final String FULLY_CONVECTIVE_BRACKET_SKIPPED = "fully_convective_bracket_skipped";
    public static final String CONV_CORE_CROSSINGS = "conv_core_crossings";
    public static final String CONV_CORE_CROSSINGS_MSUN = "conv_core_crossings_msun";
    public static final String CONV_CORE_BRACKET_SKIPPED = "conv_core_bracket_skipped";
    /**
     * The lowest mass above which every usable model has a convective core (the upper end of the last crossing
     * into a core); differs from {@link #CONV_CORE_ONSET_MSUN} when small cores come and go at lower mass, as
     * just above the fully convective limit; empty when the highest masses have no core.
     */
    public static final String LASTING_CORE_ONSET_MSUN = "lasting_core_onset_msun";
    /** The two masses that bracket it, {@code lo-hi}. */
    public static final String LASTING_CORE_BRACKET_MSUN = "lasting_core_bracket_msun";
    public static final String NOTES = "notes";

    /** The columns the README fixes, in order. */
    public static final List<String> FIXED = List.of(Z_INIT, AGE_GYR, FULLY_CONVECTIVE_LIMIT_MSUN,
            FULLY_CONVECTIVE_BRACKET_MSUN, CONV_CORE_ONSET_MSUN, CONV_CORE_BRACKET_MSUN, METHOD);

    /** Our columns after them, in order. */
    public static final List<String> EXTENSIONS = List.of(MIXING_LENGTH, OVERSHOOT_HP, CRITERION, OPACITY_SCALE,
            FULLY_CONVECTIVE_CROSSINGS, FULLY_CONVECTIVE_CROSSINGS_MSUN, FULLY_CONVECTIVE_BRACKET_SKIPPED,
            CONV_CORE_CROSSINGS, CONV_CORE_CROSSINGS_MSUN, CONV_CORE_BRACKET_SKIPPED, LASTING_CORE_ONSET_MSUN,
            LASTING_CORE_BRACKET_MSUN, NOTES);

    /** The header convgrid writes. */
    public static final List<String> HEADER = Stream.concat(FIXED.stream(), EXTENSIONS.stream()).toList();

    private TransitionColumns() {
    }
}
