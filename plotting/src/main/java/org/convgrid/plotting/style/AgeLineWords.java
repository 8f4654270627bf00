package org.convgrid.plotting.style;

/**
 * The words the charts of one line per age of the grid's models share (turnover times, envelope masses), so that a
 * reader meets the same sentence for the same thing on each.
 */
public final class AgeLineWords {

    /** The legend key of hollow markers. */
    public static final String FULLY_CONVECTIVE_LABEL = "fully convective (hollow)";
    /** Why models near the transition masses are missing. */
    public static final String GRID_ONLY_NOTE = "Grid models only: the refinement's models near the transition masses "
            + "are left out.";

    private AgeLineWords() {
    }

    /** Says why an age's line stops short of the highest masses (without it they just vanished). */
    public static String pastMainSequenceNote(long models) {
        return models + (models == 1 ? " model lies" : " models lie") + " past the main sequence at its age: not"
                + " drawn, so a line may stop short of the highest masses.";
    }
}
