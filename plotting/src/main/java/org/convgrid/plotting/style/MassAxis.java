package org.convgrid.plotting.style;

/**
 * The logarithmic stellar-mass axis shared by the mass charts, labelled at 1, 2, 3 and 5 x 10^n, or at every
 * 1..9 x 10^n when the range holds fewer than three of those, with finer labels at an end left bare
 * ({@link LogAxis#labelValues}).
 */
public final class MassAxis {

    /**
     * Axis title with unit, saying the axis is logarithmic as the age axes do: a 0.5-1.4 Msun chart's unequal steps
     * between its labels otherwise read as a linear axis drawn wrong.
     */
    public static final String TITLE = "stellar mass M / M\u2609 (logarithmic)";

    private MassAxis() {
    }

    /** Makes the x axis logarithmic over [min, max] solar masses (needs a y-axis minimum set). */
    public static void apply(StyledChart chart, double min, double max) {
        LogAxis.applyX(chart, min, max, LogAxis.labelValues(min, max));
    }
}
