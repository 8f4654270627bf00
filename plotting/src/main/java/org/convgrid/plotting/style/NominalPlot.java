package org.convgrid.plotting.style;

/**
 * The plot area of our 1200 x 800 charts, in pixels, for decisions taken before a chart is painted (XChart knows
 * where its axes lie only while it paints): which zone kinds a legend lists, which labels fit. It varies by a few
 * tens of pixels with the legend and the tick labels, which those decisions tolerate.
 */
public final class NominalPlot {

    /** Plot height, pixels. */
    public static final double HEIGHT_PX = 620;
    /** Plot width, pixels. */
    public static final double WIDTH_PX = 720;

    private NominalPlot() {
    }
}
