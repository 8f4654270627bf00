package org.convgrid.plotting.seismic;

import java.awt.Color;
import java.util.ArrayList;
import java.util.DoubleSummaryStatistics;
import java.util.List;
import org.convgrid.plotting.label.MetallicityNames;
import org.convgrid.plotting.label.SliceLabels;
import org.convgrid.plotting.style.AgeScale;
import org.convgrid.plotting.style.ChartNotes;
import org.convgrid.plotting.style.ChartStyle;
import org.convgrid.plotting.style.LogAxis;
import org.convgrid.plotting.style.StyledChart;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * Turns {@link PeriodSpacingData} into a chart: age along x (logarithmic in Myr for tracks from birth, linear in Gyr
 * from the zero-age main sequence, as on the zones-against-age charts), Delta Pi_1 in seconds up a logarithmic y axis;
 * one colour per star (the palette's order for a family of series), solid on the main sequence and dotted before it.
 * The legend names each mass, then what solid and dotted mean, in grey.
 */
public final class PeriodSpacingAgainstAgeRenderer {

    static final String TITLE = "Dipole g-mode period spacing against age, ";
    static final String Y_TITLE = "period spacing \u0394\u03a0\u2081 / s";
    static final String MAIN_SEQUENCE_LABEL = "main sequence (solid)";
    static final String PRE_MAIN_SEQUENCE_LABEL = "pre-main sequence (dotted)";
    /** What is drawn and how it is computed. */
    static final String DEFINITION_NOTE = "\u0394\u03a0\u2081 = \u03a0\u2080 / \u221a2, \u03a0\u2080 = 2\u03c0\u00b2 / "
            + "\u222b N dr / r over the g-mode cavity (first-order asymptotics, Tassoul 1980): model values.";
    /** Why a line is jagged: README, "Profiles and the g-mode period scale" (the fixed mesh). */
    static final String SCATTER_NOTE = "Steps scatter by 1-3 % about the trend: the composition step above a "
            + "receding core is not resolved by the fixed mesh (README).";
    /** The dotted pattern of {@link ChartStyle#dashed}. */
    private static final int DOTTED = 2;
    /** Room above and below the spacings, as a factor. */
    private static final double PAD_FACTOR = 1.08;

    /** Ages from birth spanning this factor or more are drawn on a logarithmic axis. */
    static final double SPAN_FOR_LOG_AGES = 10.0;

    private PeriodSpacingAgainstAgeRenderer() {
    }

    /** The note on the pre-main-sequence steps above the drawn range. */
    static String aboveCapNote(int steps, double capS) {
        return steps + " pre-main-sequence " + (steps == 1 ? "step" : "steps") + " above " + SliceLabels.number(capS)
                + " s left out: a radiative core just formed is a narrow cavity with long periods.";
    }

    /** The note when the chart draws a selection of the stars. */
    static String selectionNote(int drawn, int available) {
        return drawn + " of the " + available + " stars with a g-mode cavity drawn, spread over the masses; every "
                + "track's period_spacing_l1_s is in tracks/.";
    }

    /** The chart of one metallicity's period spacings, named as {@code names} name it; at least one line. */
    public static StyledChart render(PeriodSpacingData data, MetallicityNames names) {
        List<SpacingPoint> all = data.lines().stream().flatMap(l -> l.points().stream()).toList();
        DoubleSummaryStatistics ages = all.stream().mapToDouble(SpacingPoint::ageGyr).summaryStatistics();
        double firstAfterBirth = all.stream().mapToDouble(SpacingPoint::ageGyr).filter(a -> a > 0).min()
                .orElse(ages.getMin());
        // from a decade on: the cavity opens at a few Myr, so a young grid's 3-250 Myr drawn linearly in Gyr had its
        // whole pre-main sequence squeezed against the left edge
        AgeScale scale = AgeScale.of(data.fromBirth(), ages.getMin(), firstAfterBirth, ages.getMax(),
                SPAN_FOR_LOG_AGES);
        StyledChart chart = ChartStyle.newChart(TITLE + names.of(data.zInit()), data.physics().describe(),
                scale.title(data.fromBirth()), Y_TITLE);
        ChartStyle.legendRight(chart);
        DoubleSummaryStatistics spacings = all.stream().mapToDouble(SpacingPoint::spacingS).summaryStatistics();
        double yMin = spacings.getMin() / PAD_FACTOR;
        double yMax = spacings.getMax() * PAD_FACTOR;
        LogAxis.applyY(chart, yMin, yMax, LogAxis.labelValues(yMin, yMax));
        // XChart sizes the room left of the axis by its own (transparent) labels: whole seconds make them as wide as
        // ours ("10000"), so the axis title does not run into them
        chart.getStyler().setYAxisDecimalPattern("0");
        if (scale.logarithmic()) {
            LogAxis.applyX(chart, scale.min(), scale.max(), scale.decades(), AgeScale::label);
        } else {
            chart.getStyler().setXAxisMin(scale.min()).setXAxisMax(scale.max());
            // a leading zero: XChart's default pattern wrote 0.05 as ".05"
            chart.getStyler().setXAxisDecimalPattern("0.0##");
        }
        List<String> notes = new ArrayList<>(List.of(DEFINITION_NOTE, SCATTER_NOTE));
        if (data.stepsAboveCap() > 0) {
            notes.add(aboveCapNote(data.stepsAboveCap(), data.capS()));
        }
        if (data.tracksWithSpacing() > data.lines().size()) {
            notes.add(selectionNote(data.lines().size(), data.tracksWithSpacing()));
        }
        ChartNotes.addRightOfPlot(chart, notes);

        // Legend first, in its order (XChart lists series in the order they are added): each mass, then the grey
        // keys, each a series of one point, which draws no line and so leaves the drawing to the series below.
        int index = 0;
        SpacingPoint anchor = data.lines().get(0).points().get(0);
        for (SpacingLine line : data.lines()) {
            XYSeries s = series(chart, SliceLabels.number(line.massMsun()) + " M\u2609", List.of(anchor), scale);
            s.setLineColor(ChartStyle.seriesColor(index++));
            s.setShowInLegend(true);
        }
        XYSeries solid = series(chart, MAIN_SEQUENCE_LABEL, List.of(anchor), scale);
        solid.setLineColor(ChartStyle.KEY_GREY);
        solid.setShowInLegend(true);
        boolean anyPreMainSequence = all.stream().anyMatch(SpacingPoint::preMainSequence);
        if (anyPreMainSequence) {
            XYSeries dotted = series(chart, PRE_MAIN_SEQUENCE_LABEL, List.of(anchor), scale);
            dotted.setLineColor(ChartStyle.KEY_GREY);
            dotted.setLineStyle(ChartStyle.dashed(DOTTED, ChartStyle.LINE_WIDTH));
            dotted.setShowInLegend(true);
        }

        // The drawing: per star its pre-main-sequence part dotted (up to its first main-sequence step, so the two
        // parts join), then its main-sequence part solid.
        index = 0;
        int n = 0;
        for (SpacingLine line : data.lines()) {
            Color colour = ChartStyle.seriesColor(index++);
            List<SpacingPoint> before = new ArrayList<>();
            List<SpacingPoint> after = new ArrayList<>();
            for (SpacingPoint p : line.points()) {
                if (p.preMainSequence()) {
                    before.add(p);
                } else {
                    if (after.isEmpty() && !before.isEmpty()) {
                        before.add(p);
                    }
                    after.add(p);
                }
            }
            if (before.size() >= 2) {
                XYSeries s = series(chart, "pre-main sequence " + n++, before, scale);
                s.setLineColor(colour);
                s.setLineStyle(ChartStyle.dashed(DOTTED, ChartStyle.LINE_WIDTH));
            }
            if (after.size() >= 2) {
                XYSeries s = series(chart, "main sequence " + n++, after, scale);
                s.setLineColor(colour);
            }
        }
        return chart;
    }

    /** A solid line through the points, without markers, out of the legend unless the caller says. */
    private static XYSeries series(StyledChart chart, String name, List<SpacingPoint> points, AgeScale scale) {
        double[] x = points.stream().mapToDouble(p -> scale.logarithmic() ? scale.x(p.ageGyr()) : p.ageGyr())
                .toArray();
        double[] y = points.stream().mapToDouble(SpacingPoint::spacingS).toArray();
        XYSeries s = chart.addSeries(name, x, y);
        s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Line);
        s.setMarker(SeriesMarkers.NONE);
        s.setLineStyle(ChartStyle.dashed(0, ChartStyle.LINE_WIDTH));
        s.setShowInLegend(false);
        return s;
    }
}
