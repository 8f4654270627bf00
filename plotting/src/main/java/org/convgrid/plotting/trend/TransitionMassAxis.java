package org.convgrid.plotting.trend;

import org.convgrid.plotting.style.StyledChart;

/** The transition-mass (y) axis of both trend charts: from zero to a round value above the highest mass shown. */
final class TransitionMassAxis {

    /** Room above the highest mass (bracket or window top), as a share of it, for the labels of the top markers. */
    private static final double HEADROOM_SHARE = 0.15;

    private TransitionMassAxis() {
    }

    /** Sets the y axis of {@code chart} for masses up to {@code highestMsun}. */
    static void apply(StyledChart chart, double highestMsun) {
        chart.getStyler().setYAxisMin(0.0).setYAxisMax(Math.ceil(highestMsun * (1 + HEADROOM_SHARE) * 10) / 10);
        chart.getStyler().setYAxisDecimalPattern("0.0#");
    }
}
