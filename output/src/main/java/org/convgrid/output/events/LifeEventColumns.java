package org.convgrid.output.events;

import java.util.List;

/** The columns of {@code life_events.csv}, spelled once for {@link LifeEventWriter} and {@link LifeEventReader}. */
public final class LifeEventColumns {

    public static final String TRACK_ID = "track_id";
    public static final String MASS = "mass_msun";
    public static final String Z_INIT = "z_init";
    public static final String Y_INIT = "y_init";
    /** Spectroscopic [Fe/H] of z_init and y_init (the catalogue's column of that name); empty when Z = 0. */
    public static final String FE_H_DEX = "fe_h_dex";
    public static final String MIXING_LENGTH = "mixing_length";
    public static final String OVERSHOOT = "overshoot_hp";
    public static final String OVERSHOOT_PROFILE = "overshoot_profile";
    public static final String RADIATIVE_CORE = "radiative_core_myr";
    public static final String RADIATIVE_CORE_END = "radiative_core_end_myr";
    public static final String ZAMS = "zams_myr";
    public static final String CONV_CORE_ONSET = "conv_core_onset_myr";
    public static final String CONV_CORE_END = "conv_core_end_myr";
    /** On the main sequence, a central convective zone first joins the envelope (the star fully convective again). */
    public static final String CORE_ENVELOPE_MERGE = "core_envelope_merge_myr";
    public static final String LI_HALVED = "li_halved_myr";
    /** The surface lithium falls to 1 % of its birth value. */
    public static final String LI_ONE_PERCENT = "li_one_percent_myr";
    public static final String CENTRAL_H_EXHAUSTED = "central_h_exhausted_myr";
    public static final String TRACK_END = "track_end_myr";

    /** Every column, in the order the writer writes them. */
    public static final List<String> ALL = List.of(TRACK_ID, MASS, Z_INIT, Y_INIT, FE_H_DEX, MIXING_LENGTH,
            OVERSHOOT, OVERSHOOT_PROFILE, RADIATIVE_CORE, RADIATIVE_CORE_END, ZAMS, CONV_CORE_ONSET, CONV_CORE_END,
            CORE_ENVELOPE_MERGE, LI_HALVED, LI_ONE_PERCENT, CENTRAL_H_EXHAUSTED, TRACK_END);

    /**
     * The columns every readable table has. Tables written before {@link #CENTRAL_H_EXHAUSTED},
     * {@link #RADIATIVE_CORE_END}, {@link #TRACK_END}, {@link #OVERSHOOT_PROFILE}, {@link #LI_ONE_PERCENT} and
     * {@link #CORE_ENVELOPE_MERGE} were added lack them (read as empty); {@link #FE_H_DEX} is never read, being
     * computed from z_init and y_init whenever a row is written.
     */
    public static final List<String> REQUIRED = List.of(TRACK_ID, MASS, Z_INIT, Y_INIT, MIXING_LENGTH, OVERSHOOT,
            RADIATIVE_CORE, ZAMS, CONV_CORE_ONSET, CONV_CORE_END, LI_HALVED);

    private LifeEventColumns() {
    }
}
